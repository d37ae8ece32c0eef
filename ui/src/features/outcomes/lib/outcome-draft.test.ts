import { describe, expect, it } from 'vitest';
import type { OutcomeDto } from '@fuelwright/shared';
import { correctionChains, draftFromOutcome, draftToRequest, EMPTY_DRAFT, validateDraft } from './outcome-draft';

function outcome(id: string, overrides: Partial<OutcomeDto> = {}): OutcomeDto {
  return {
    id,
    caseId: 'case-1',
    workOrderId: null,
    rulesetVersion: '1.0.0',
    symptomIds: ['bog-on-acceleration'],
    topCauseId: 'foam-degraded',
    confirmedCauses: ['foam-degraded'],
    otherNote: '',
    fix: 'New foam',
    parts: '',
    labourMinutes: null,
    stillFixed: null,
    supersedesId: null,
    current: true,
    loggedByName: 'Test shop',
    demo: false,
    at: '2026-11-01T10:00:00.000Z',
    ...overrides,
  };
}

describe('outcome draft', () => {
  it('asks for a cause, a fix, a note for "something else", and whole minutes in range', () => {
    expect(validateDraft(EMPTY_DRAFT)).toEqual({ confirmedCauses: expect.any(String), fix: expect.any(String) });
    expect(validateDraft({ ...EMPTY_DRAFT, causes: ['something-else'], fix: 'x' })).toEqual({ otherNote: 'Say what it was.' });
    expect(validateDraft({ ...EMPTY_DRAFT, causes: ['a', 'b', 'c', 'd', 'e', 'f'], fix: 'x' }).confirmedCauses).toMatch(/at most 5/);
    for (const bad of ['12.5', '-1', '6001', 'ten']) expect(validateDraft({ ...EMPTY_DRAFT, causes: ['a'], fix: 'x', labourMinutes: bad }).labourMinutes).toBeDefined();
    expect(validateDraft({ ...EMPTY_DRAFT, causes: ['a'], fix: 'x', labourMinutes: ' 45 ' })).toEqual({});
  });

  it('sends only what was filled in, trimmed; the follow-up only when known', () => {
    expect(draftToRequest({ ...EMPTY_DRAFT, causes: ['foam-degraded'], fix: '  New foam ', otherNote: 'ignored' }, { caseId: 'c1' })).toEqual({
      caseId: 'c1',
      confirmedCauses: ['foam-degraded'],
      fix: 'New foam',
    });
    expect(
      draftToRequest(
        { causes: ['something-else'], otherNote: ' Cracked reed ', fix: 'Reed replaced', parts: 'Reed', labourMinutes: '40', stillFixed: 'no' },
        { workOrderId: 'w1' },
        'old-id',
      ),
    ).toEqual({
      workOrderId: 'w1',
      confirmedCauses: ['something-else'],
      otherNote: 'Cracked reed',
      fix: 'Reed replaced',
      parts: 'Reed',
      labourMinutes: 40,
      stillFixed: false,
      supersedesId: 'old-id',
    });
  });

  it('fills a correction from the entry it corrects', () => {
    expect(draftFromOutcome(outcome('o1', { labourMinutes: 20, stillFixed: true, parts: 'Foam set' }))).toEqual({
      causes: ['foam-degraded'],
      otherNote: '',
      fix: 'New foam',
      parts: 'Foam set',
      labourMinutes: '20',
      stillFixed: 'yes',
    });
  });

  it('groups each current entry with the entries it corrects, newest first', () => {
    const first = outcome('o1', { current: false, at: '2026-11-01T10:00:00.000Z' });
    const second = outcome('o2', { current: false, supersedesId: 'o1', at: '2026-11-02T10:00:00.000Z' });
    const third = outcome('o3', { supersedesId: 'o2', at: '2026-11-03T10:00:00.000Z' });
    const other = outcome('o4', { at: '2026-11-04T10:00:00.000Z' });
    const chains = correctionChains([first, third, other, second]);
    expect(chains.map((c) => [c.current.id, c.corrected.map((o) => o.id)])).toEqual([
      ['o4', []],
      ['o3', ['o2', 'o1']],
    ]);
  });
});
