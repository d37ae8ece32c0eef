import { describe, expect, it } from 'vitest';
import { SETUP_RANGES, type SetupDto } from '@fuelwright/shared';
import { parsePremix, setupFormFrom, todayIso, validateSetupForm, type SetupFormValues } from './setup-form';

// The ranges checked here are the product's own input rules (shared/src/setup.ts SETUP_RANGES;
// bad input is a 400 naming the field), which the client must apply exactly as the server does. They are not
// facts of the trade, so no trade source applies.

const TODAY = '2026-11-30';

const blank = (patch: Partial<SetupFormValues> = {}): SetupFormValues => ({ ...setupFormFrom(undefined, TODAY), ...patch });

const LATEST: SetupDto = {
  id: 's2',
  kartId: 'k1',
  takenOn: '2026-11-21',
  note: 'Warm afternoon',
  createdAt: '2026-11-21T15:00:00.000Z',
  changedFields: ['mainJet'],
  mainJet: 182.5,
  pilotJet: 37.5,
  needleClipGroove: 3,
  airScrewTurnsOut: 1.75,
  idleScrew: 'set',
  idleScrewTurns: 1,
  foamFittedDate: '2026-03-01',
  lastRebuildDate: '2026-03-02',
  premixRatio: 32,
  ventLinesFitted: true,
  ventLinesRoutedUp: false,
};

describe('setup form: starting values', () => {
  it('starts from the latest snapshot, dated today, with an empty note', () => {
    const values = setupFormFrom(LATEST, TODAY);
    expect(values).toEqual({
      takenOn: TODAY,
      mainJet: '182.5',
      pilotJet: '37.5',
      needleClipGroove: '3',
      airScrewTurnsOut: '1.75',
      idleScrew: 'set',
      idleScrewTurns: '1',
      foamFittedDate: '2026-03-01',
      lastRebuildDate: '2026-03-02',
      premixRatio: '32',
      ventLinesFitted: 'yes',
      ventLinesRoutedUp: 'no',
      note: '',
    });
  });

  it('sends back exactly the latest snapshot when nothing is changed', () => {
    const { input, errors } = validateSetupForm(setupFormFrom(LATEST, TODAY), TODAY);
    expect(errors).toEqual({});
    expect(input).toEqual({
      takenOn: TODAY,
      mainJet: 182.5,
      pilotJet: 37.5,
      needleClipGroove: 3,
      airScrewTurnsOut: 1.75,
      idleScrew: 'set',
      idleScrewTurns: 1,
      foamFittedDate: '2026-03-01',
      lastRebuildDate: '2026-03-02',
      premixRatio: 32,
      ventLinesFitted: true,
      ventLinesRoutedUp: false,
    });
  });

  it('writes today in the local calendar', () => {
    expect(todayIso(new Date(2026, 0, 5, 23, 59))).toBe('2026-01-05');
  });
});

describe('setup form: validation', () => {
  it('leaves empty fields out (not recorded) and needs only the date', () => {
    expect(validateSetupForm(blank(), TODAY)).toEqual({ input: { takenOn: TODAY }, errors: {} });
    expect(validateSetupForm(blank({ takenOn: '' }), TODAY).errors.takenOn).toEqual(['Enter the day the kart ran with this setup.']);
  });

  it.each(Object.entries(SETUP_RANGES))('accepts %s at both ends of its range and refuses just outside', (field, range) => {
    const f = field as keyof typeof SETUP_RANGES;
    for (const ok of [range.min, range.max]) {
      const parsed = validateSetupForm(blank({ [f]: String(ok) }), TODAY);
      expect(parsed.errors[f]).toBeUndefined();
      expect(parsed.input?.[f]).toBe(ok);
    }
    for (const bad of [range.min - 1, range.max + 1]) {
      const parsed = validateSetupForm(blank({ [f]: String(bad) }), TODAY);
      expect(parsed.input).toBeNull();
      expect(parsed.errors[f]?.[0]).toContain(String(range.min));
      expect(parsed.errors[f]?.[0]).toContain(String(range.max));
    }
  });

  it('explains each refusal in trade words', () => {
    const { errors } = validateSetupForm(
      blank({ mainJet: '20', pilotJet: 'big', needleClipGroove: '2.5', airScrewTurnsOut: '9', premixRatio: '5' }),
      TODAY,
    );
    expect(errors).toEqual({
      mainJet: ['Main jets run from 50 to 400: check the number stamped on the jet.'],
      pilotJet: ['Write the pilot jet size (the number stamped on the jet) as a number, for example 37.5.'],
      needleClipGroove: ['Use a whole groove number, counted from the top of the needle: 1 (top groove) to 7.'],
      airScrewTurnsOut: ['The air screw is from 0 to 6 turns out from lightly seated.'],
      premixRatio: ['Premix ratios run from 8:1 to 100:1 (write 32 for 32:1).'],
    });
  });

  it('takes a decimal comma and a ratio written 32:1', () => {
    const { input } = validateSetupForm(blank({ pilotJet: '37,5', airScrewTurnsOut: ' 1,75 ', premixRatio: '32:1' }), TODAY);
    expect(input).toMatchObject({ pilotJet: 37.5, airScrewTurnsOut: 1.75, premixRatio: 32 });
    expect(parsePremix('40 : 1')).toBe(40);
    expect(parsePremix('1:40')).toBeNull();
    expect(parsePremix('-32')).toBe(-32);
    expect(validateSetupForm(blank({ premixRatio: '-32' }), TODAY).errors.premixRatio).toEqual([
      'Premix ratios run from 8:1 to 100:1 (write 32 for 32:1).',
    ]);
  });

  it('refuses dates in the future, impossible dates and dates before 1970', () => {
    const { errors } = validateSetupForm(
      blank({ takenOn: '2026-12-01', foamFittedDate: '2026-02-30', lastRebuildDate: '1969-12-31' }),
      TODAY,
    );
    expect(errors).toEqual({
      takenOn: ['The day the kart ran with this setup cannot be in the future.'],
      foamFittedDate: ['Write the day new foam went into the bowl as a date (year-month-day).'],
      lastRebuildDate: ['Check the year of the day of the last rebuild.'],
    });
    expect(validateSetupForm(blank({ takenOn: TODAY, foamFittedDate: TODAY }), TODAY).errors).toEqual({});
  });

  it('records "routed up" only when vent lines are fitted or not recorded', () => {
    expect(validateSetupForm(blank({ ventLinesFitted: 'no', ventLinesRoutedUp: 'yes' }), TODAY).input).toEqual({
      takenOn: TODAY,
      ventLinesFitted: false,
    });
    expect(validateSetupForm(blank({ ventLinesFitted: 'yes', ventLinesRoutedUp: 'yes' }), TODAY).input).toEqual({
      takenOn: TODAY,
      ventLinesFitted: true,
      ventLinesRoutedUp: true,
    });
  });

  it('refuses a note longer than the server takes', () => {
    expect(validateSetupForm(blank({ note: 'x'.repeat(2001) }), TODAY).errors.note).toHaveLength(1);
    expect(validateSetupForm(blank({ note: '  Ran well  ' }), TODAY).input?.note).toBe('Ran well');
  });
});
