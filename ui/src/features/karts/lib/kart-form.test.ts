import { describe, expect, it } from 'vitest';
import { DISPLACEMENT_RANGE_CC } from '@fuelwright/shared';
import { EMPTY_KART_FORM, validateKartForm } from './kart-form';

// The limits are the product's own input rules (shared/src/karts.ts), applied as the server does.

describe('kart form', () => {
  it('asks for every required field in plain words', () => {
    expect(validateKartForm(EMPTY_KART_FORM)).toEqual({
      input: null,
      errors: {
        name: ['Give the kart a name: a number or nickname you know it by.'],
        displacementCc: ['Enter the engine size in cc, as stamped on the engine (for example 125).'],
        drive: ['Pick gearbox or direct drive.'],
        carburettorKind: ['Pick the kind of carburettor: pump-around or float-valve.'],
      },
    });
  });

  it('takes whole cc from the lowest to the highest kart engine and nothing outside', () => {
    const form = { ...EMPTY_KART_FORM, name: ' Blue 27 ', drive: 'gearbox', carburettorKind: 'pump-around' } as const;
    for (const cc of [DISPLACEMENT_RANGE_CC.min, DISPLACEMENT_RANGE_CC.max]) {
      expect(validateKartForm({ ...form, displacementCc: String(cc) }).input).toEqual({
        name: 'Blue 27',
        displacementCc: cc,
        drive: 'gearbox',
        carburettorKind: 'pump-around',
        notes: '',
      });
    }
    for (const bad of [String(DISPLACEMENT_RANGE_CC.min - 1), String(DISPLACEMENT_RANGE_CC.max + 1)]) {
      expect(validateKartForm({ ...form, displacementCc: bad }).errors.displacementCc).toEqual(['Kart engines run from 50 to 250 cc.']);
    }
    expect(validateKartForm({ ...form, displacementCc: '124.5' }).errors.displacementCc).toEqual([
      'Write the engine size as a whole number of cc, for example 125.',
    ]);
  });
});
