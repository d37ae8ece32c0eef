import { describe, expect, it } from 'vitest';
import { filterRows, formatChange, formatInterval, formatWeight, ruleLabel, sortRows, type DiffRow } from './diff';
import { compareVersions, nextVersion } from './versions';

const row = (id: string, o: Partial<DiffRow> = {}): DiffRow => ({
  kind: 'rule',
  id,
  cause: 'foam-degraded',
  file: 'rules/bowl.json',
  old: 2,
  proposed: 2,
  changed: false,
  outcomes: 10,
  interval: [1, 3],
  disagrees: false,
  kept: false,
  flat: false,
  ...o,
});

describe('proposal diff', () => {
  it('puts changed weights first, those the outcomes contradict at the top, then the largest moves', () => {
    const rows = [
      row('same'),
      row('small-move', { changed: true, proposed: 2.2 }),
      row('big-move', { changed: true, proposed: 6 }),
      row('contradicted', { changed: true, proposed: 2.1, disagrees: true }),
      row('halved', { changed: true, proposed: 1 }),
    ];
    expect(sortRows(rows).map((r) => r.id)).toEqual(['contradicted', 'big-move', 'halved', 'small-move', 'same']);
  });

  it('filters by what changed, by disagreement, and by words in the name, cause or its label', () => {
    const rows = [row('hesitation--foam-degraded', { changed: true }), row('fuel-from-vents--vent-lines-off', { cause: 'vent-lines-off', disagrees: true })];
    const label = (id: string) => (id === 'vent-lines-off' ? 'Vent lines missing or not routed up' : 'Bowl foam missing');
    expect(filterRows(rows, 'changed', '', label).map((r) => r.id)).toEqual(['hesitation--foam-degraded']);
    expect(filterRows(rows, 'disagrees', '', label).map((r) => r.id)).toEqual(['fuel-from-vents--vent-lines-off']);
    expect(filterRows(rows, 'all', 'routed UP', label).map((r) => r.id)).toEqual(['fuel-from-vents--vent-lines-off']);
    expect(filterRows(rows, 'all', 'foam hesitation', label).map((r) => r.id)).toEqual(['hesitation--foam-degraded']);
    expect(filterRows(rows, 'changed', 'vent', label)).toEqual([]);
    expect(filterRows(rows, 'all', 'stutters', label, (r) => (r.id.startsWith('hesitation') ? 'Hesitates or stutters' : '')).map((r) => r.id)).toEqual(['hesitation--foam-degraded']);
  });

  it('writes weights with three significant digits and moves as signed percents', () => {
    expect(formatWeight(0.065712)).toBe('0.0657');
    expect(formatWeight(4.4649)).toBe('4.46');
    expect(formatWeight(12)).toBe('12');
    expect(formatWeight(5.47e-294)).toBe('< 0.0001');
    expect(formatWeight(3e7)).toBe('> 100000');
    expect(formatInterval([0.0196, 0.188])).toBe('0.0196–0.188');
    expect(formatInterval([2e-30, 0.0242])).toBe('up to 0.0242');
    expect(formatInterval([0, 1e-5])).toBe('below 0.0001');
    expect(formatInterval([0.5, 3e6])).toBe('0.5 or more');
    expect(formatInterval([1e-9, 3e6])).toBe('too wide to bound (too few outcomes)');
    expect(formatChange(0.05, 0.0657)).toBe('+31 %');
    expect(formatChange(4, 3)).toBe('−25 %');
    expect(formatChange(2, 2.001)).toBe('0 %');
    expect(formatChange(0, 1)).toBe('—');
  });

  it('names rules in words: a symptom’s label (with its detail), or the fact', () => {
    const symptom = (id: string) => (id === 'hesitation' ? 'Hesitates or stutters' : undefined);
    expect(ruleLabel('hesitation--foam-degraded', symptom)).toBe('“Hesitates or stutters”');
    expect(ruleLabel('hesitation--foam-degraded--corner-exit', symptom)).toBe('“Hesitates or stutters” (corner exit)');
    expect(ruleLabel('idle-screw-recorded-backed-off', symptom)).toBe('Idle screw recorded backed off');
  });

  it('suggests the next minor version after the highest one published', () => {
    expect(nextVersion(['1.0.0'])).toBe('1.1.0');
    expect(nextVersion(['1.0.0', '1.1.0', '1.0.3'])).toBe('1.2.0');
    expect(nextVersion(['1.9.0', '1.10.0'])).toBe('1.11.0');
    expect(nextVersion([])).toBe('1.0.0');
    expect(compareVersions('1.10.0', '1.9.0')).toBeGreaterThan(0);
  });
});
