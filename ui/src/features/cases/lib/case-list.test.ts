import { describe, expect, it } from 'vitest';
import type { CaseSummaryDto } from '@fuelwright/shared';
import { filterCases, formatProbability, localDay, NO_TOP_CAUSE, nextSort, parseSort, sortCases, topCauseOptions } from './case-list';
import { catalogLabels, humanizeId } from './catalog-labels';

const summary = (patch: Partial<CaseSummaryDto> & Pick<CaseSummaryDto, 'id'>): CaseSummaryDto => ({
  kartId: 'k',
  kartName: 'Kart',
  ownerId: 'u',
  ownerName: 'Racer',
  state: 'open',
  rulesetVersion: '1.0.0',
  symptomIds: ['bog'],
  topCauseId: 'foam',
  topCauseProbability: 0.5,
  openedAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-01T10:00:00.000Z',
  ...patch,
});

const CASES = [
  summary({ id: 'a', kartName: 'blue 27', state: 'resolved', topCauseId: 'vents', topCauseProbability: 0.9, openedAt: '2026-10-01T08:00:00Z', updatedAt: '2026-10-03T08:00:00Z' }),
  summary({ id: 'b', kartName: 'Practice', state: 'open', topCauseId: 'foam', topCauseProbability: 0.3, openedAt: '2026-11-02T08:00:00Z', updatedAt: '2026-11-02T09:00:00Z' }),
  summary({ id: 'c', kartName: 'Blue 3', state: 'stopped', topCauseId: null, topCauseProbability: null, openedAt: '2026-09-01T08:00:00Z', updatedAt: '2026-11-05T08:00:00Z' }),
];

const LABELS = {
  cause: (id: string) => ({ vents: 'Vent lines off', foam: 'Bowl foam rotten' })[id] ?? id,
  symptom: (id: string) => id,
};

const ids = (list: CaseSummaryDto[]) => list.map((c) => c.id);

describe('case list sorting', () => {
  it('sorts by every column, both ways', () => {
    expect(ids(sortCases(CASES, { key: 'updated', dir: 'desc' }, LABELS))).toEqual(['c', 'b', 'a']);
    expect(ids(sortCases(CASES, { key: 'updated', dir: 'asc' }, LABELS))).toEqual(['a', 'b', 'c']);
    expect(ids(sortCases(CASES, { key: 'opened', dir: 'desc' }, LABELS))).toEqual(['b', 'a', 'c']);
    // Names compare without case and with numbers in order: "Blue 3" before "blue 27".
    expect(ids(sortCases(CASES, { key: 'kart', dir: 'asc' }, LABELS))).toEqual(['c', 'a', 'b']);
    expect(ids(sortCases(CASES, { key: 'kart', dir: 'desc' }, LABELS))).toEqual(['b', 'a', 'c']);
    // Open cases first, in the order of CASE_STATES.
    expect(ids(sortCases(CASES, { key: 'state', dir: 'asc' }, LABELS))).toEqual(['b', 'a', 'c']);
  });

  it('sorts the top cause by its label and the probability by its number, with no cause last either way', () => {
    expect(ids(sortCases(CASES, { key: 'topCause', dir: 'asc' }, LABELS))).toEqual(['b', 'a', 'c']);
    expect(ids(sortCases(CASES, { key: 'topCause', dir: 'desc' }, LABELS))).toEqual(['a', 'b', 'c']);
    expect(ids(sortCases(CASES, { key: 'probability', dir: 'desc' }, LABELS))).toEqual(['a', 'b', 'c']);
    expect(ids(sortCases(CASES, { key: 'probability', dir: 'asc' }, LABELS))).toEqual(['b', 'a', 'c']);
  });

  it('does not change the list it is given', () => {
    const copy = [...CASES];
    sortCases(CASES, { key: 'kart', dir: 'asc' }, LABELS);
    expect(CASES).toEqual(copy);
  });

  it('flips the same column and starts a new one in its natural order', () => {
    expect(nextSort({ key: 'kart', dir: 'asc' }, 'kart')).toEqual({ key: 'kart', dir: 'desc' });
    expect(nextSort({ key: 'kart', dir: 'asc' }, 'opened')).toEqual({ key: 'opened', dir: 'desc' });
    expect(nextSort({ key: 'opened', dir: 'desc' }, 'state')).toEqual({ key: 'state', dir: 'asc' });
  });

  it('reads the sort from the address, falling back to the last change first', () => {
    expect(parseSort('probability', null)).toEqual({ key: 'probability', dir: 'desc' });
    expect(parseSort('kart', 'desc')).toEqual({ key: 'kart', dir: 'desc' });
    expect(parseSort('nonsense', 'asc')).toEqual({ key: 'updated', dir: 'desc' });
    expect(parseSort(null, null)).toEqual({ key: 'updated', dir: 'desc' });
  });

  it('writes probabilities as whole percentages without claiming 0% or 100%', () => {
    expect(formatProbability(0.4768)).toBe('48%');
    expect(formatProbability(0.003)).toBe('<1%');
    expect(formatProbability(0.996)).toBe('>99%');
    expect(formatProbability(1)).toBe('100%');
    expect(formatProbability(0)).toBe('0%');
  });
});

describe('catalog labels', () => {
  const catalog = {
    symptoms: [{ id: 'bog-on-acceleration', label: 'Bogs when you open the throttle' }],
    causes: [{ id: 'foam-degraded', label: 'Bowl foam missing, rotten or soaked' }],
    checks: [{ id: 'foam-inspect', label: 'Look at the bowl foam' }],
    fixes: [{ id: 'replace-foam', label: 'Fit new foam' }],
    somethingElse: { label: 'Something else', prior: 0.1 },
  } as unknown as Parameters<typeof catalogLabels>[0];

  it('labels ids from the catalog and falls back to words', () => {
    const labels = catalogLabels(catalog);
    expect(labels.cause('foam-degraded')).toBe('Bowl foam missing, rotten or soaked');
    expect(labels.cause('something-else')).toBe('Something else');
    expect(labels.check('unknown-check')).toBe('Unknown check');
    expect(humanizeId('')).toBe('');
  });

  it('puts labels in place of the ids of a timeline line and leaves other words alone', () => {
    const labels = catalogLabels(catalog);
    expect(labels.text('foam-inspect: Fault found (foam crumbles)')).toBe('“Look at the bowl foam”: Fault found (foam crumbles)');
    expect(labels.text('Resolved: foam-degraded, fixed by replaced foam')).toBe(
      'Resolved: “Bowl foam missing, rotten or soaked”, fixed by replaced foam',
    );
    expect(labels.text('Case opened with 2 symptoms (ruleset 1.0.0)')).toBe('Case opened with 2 symptoms (ruleset 1.0.0)');
    expect(labels.text('left well-alone as is')).toBe('left well-alone as is');
  });
});

describe('case list filters', () => {
  it('keeps the cases with the chosen top cause, or those not ranked yet', () => {
    expect(ids(filterCases(CASES, { cause: 'foam' }))).toEqual(['b']);
    expect(ids(filterCases(CASES, { cause: NO_TOP_CAUSE }))).toEqual(['c']);
    expect(ids(filterCases(CASES, {}))).toEqual(['a', 'b', 'c']);
  });

  it('keeps the cases opened within the period, both days included, in the local calendar', () => {
    const day = (c: CaseSummaryDto) => localDay(c.openedAt);
    const [a, b] = CASES;
    expect(ids(filterCases(CASES, { from: day(a), to: day(b) }))).toEqual(['a', 'b']);
    expect(ids(filterCases(CASES, { from: day(b) }))).toEqual(['b']);
    expect(ids(filterCases(CASES, { to: day(a) }))).toEqual(['a', 'c']);
    expect(ids(filterCases(CASES, { cause: 'vents', from: day(b) }))).toEqual([]);
    const local = new Date(2026, 10, 2, 23, 30);
    expect(localDay(local.toISOString())).toBe('2026-11-02');
  });

  it('offers the causes present, by label, "None yet" last, and keeps a chosen cause the list lacks', () => {
    expect(topCauseOptions(CASES, LABELS)).toEqual([
      { value: 'foam', label: 'Bowl foam rotten' },
      { value: 'vents', label: 'Vent lines off' },
      { value: NO_TOP_CAUSE, label: 'None yet' },
    ]);
    expect(topCauseOptions([CASES[1]], LABELS, 'vents').map((o) => o.value)).toEqual(['foam', 'vents']);
  });
});
