/**
 * Insight metrics on hand-made rankings and outcomes; every expected number is worked out by hand
 * beside the check. Definitions: top-k accuracy and the multi-category Brier score (Brier 1950,
 * "Verification of forecasts expressed in terms of probability", Monthly Weather Review 78(1)),
 * reliability bins and the expected calibration error (Guo et al. 2017, "On calibration of modern
 * neural networks", ICML), Welford's running variance (Welford 1962, Technometrics 4(3)).
 */
import { describe, expect, it } from 'vitest';
import { validateRuleset } from '../validate.js';
import { tinySource } from '../test-support/tiny.js';
import {
  AccuracyAccumulator,
  CalibrationAccumulator,
  InsightsAccumulator,
  LabourAccumulator,
  SymptomCauseAccumulator,
  WrongWayRulesAccumulator,
  brierScore,
  calibrationBinIndex,
  computeInsights,
  topKHit,
} from './metrics.js';
import type { OutcomeRecord, RankingEntry } from './outcome.js';

const w = (...ids: string[]) => new Map(ids.map((id) => [id, 1 / ids.length]));

/** The tiny test ruleset plus a rule against cause A (LR 0.5) on symptom B. */
function rulesetWithAgainstRule() {
  const src = tinySource();
  (src.ruleFiles['rules/tiny.json'] as { rules: unknown[] }).rules.push({
    name: 'b-against-a',
    conditions: { all: [{ fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-b' } }] },
    event: { type: 'likelihood', params: { cause: 'cause-a', lr: 0.5, reason: 'B speaks against cause A.' } },
  });
  return validateRuleset(src);
}

describe('top-k and Brier score of one ranking', () => {
  const r1: RankingEntry[] = [
    { id: 'a', probability: 0.5 },
    { id: 'b', probability: 0.3 },
    { id: 'something-else', probability: 0.2 },
  ];

  it('finds the confirmed cause in the top k', () => {
    expect(topKHit(r1, ['b'], 1)).toBe(false);
    expect(topKHit(r1, ['b'], 2)).toBe(true);
    expect(topKHit(r1, ['something-else'], 3)).toBe(true);
    expect(topKHit(r1, ['d'], 3)).toBe(false);
    // Order comes from the probabilities, not the list order.
    expect(topKHit([...r1].reverse(), ['a'], 1)).toBe(true);
  });

  it('breaks ties by list order', () => {
    const tie = [
      { id: 'x', probability: 0.4 },
      { id: 'y', probability: 0.4 },
      { id: 'z', probability: 0.2 },
    ];
    expect(topKHit(tie, ['x'], 1)).toBe(true);
    expect(topKHit(tie, ['y'], 1)).toBe(false);
  });

  it('scores (0.5, 0.3, 0.2) against b as 0.25 + 0.49 + 0.04 = 0.78', () => {
    expect(brierScore(r1, w('b'))).toBeCloseTo(0.78, 15);
  });

  it('splits the target over two confirmed causes: (0.7, 0.2, 0.1) against a and c -> 0.04 + 0.04 + 0.16 = 0.24', () => {
    const r = [
      { id: 'a', probability: 0.7 },
      { id: 'b', probability: 0.2 },
      { id: 'c', probability: 0.1 },
    ];
    expect(brierScore(r, w('a', 'c'))).toBeCloseTo(0.24, 15);
  });

  it('counts a confirmed cause the ranking left out at probability 0: 0.36 + 0.16 + 1 = 1.52', () => {
    const r = [
      { id: 'a', probability: 0.6 },
      { id: 'something-else', probability: 0.4 },
    ];
    expect(brierScore(r, w('d'))).toBeCloseTo(1.52, 15);
  });

  it('runs from 0 (certain and right) to 2 (certain and wrong)', () => {
    const sure = [
      { id: 'a', probability: 1 },
      { id: 'b', probability: 0 },
    ];
    expect(brierScore(sure, w('a'))).toBe(0);
    expect(brierScore(sure, w('b'))).toBe(2);
  });
});

describe('accuracy accumulator', () => {
  it('averages over rankings', () => {
    const acc = new AccuracyAccumulator();
    expect(acc.result()).toMatchObject({ ranked: 0, top1Rate: 0, top3Rate: 0 });
    expect(Number.isNaN(acc.result().brier)).toBe(true);
    acc.add(
      [
        { id: 'a', probability: 0.5 },
        { id: 'b', probability: 0.3 },
        { id: 'something-else', probability: 0.2 },
      ],
      w('b'),
    ); // top-1 miss, top-3 hit, 0.78
    acc.add(
      [
        { id: 'a', probability: 0.6 },
        { id: 'something-else', probability: 0.4 },
      ],
      w('a'),
    ); // hit, hit, 0.16 + 0.16 = 0.32
    expect(acc.result()).toEqual({ ranked: 2, top1: 1, top3: 2, top1Rate: 0.5, top3Rate: 1, brier: expect.closeTo(0.55, 15) });
  });
});

describe('calibration bins', () => {
  it('puts p in floor(10 p), with 1 in the last bin', () => {
    expect(calibrationBinIndex(0, 10)).toBe(0);
    expect(calibrationBinIndex(0.0999, 10)).toBe(0);
    expect(calibrationBinIndex(0.1, 10)).toBe(1);
    expect(calibrationBinIndex(0.95, 10)).toBe(9);
    expect(calibrationBinIndex(1, 10)).toBe(9);
  });

  it('reports count, mean prediction and observed frequency per bin, and the ECE', () => {
    const cal = new CalibrationAccumulator(10);
    for (const [p, y] of [
      [0.05, 0],
      [0.07, 1],
      [0, 0],
      [0.55, 1],
      [0.95, 1],
      [1, 1],
    ]) {
      cal.addPrediction(p, y);
    }
    const r = cal.result();
    expect(r.count).toBe(6);
    expect(r.bins).toHaveLength(10);
    expect(r.bins[0]).toMatchObject({ from: 0, to: 0.1, count: 3 });
    expect(r.bins[0].meanPredicted).toBeCloseTo(0.04, 15); // (0.05 + 0.07 + 0) / 3
    expect(r.bins[0].observed).toBeCloseTo(1 / 3, 15);
    expect(r.bins[5]).toMatchObject({ count: 1, meanPredicted: 0.55, observed: 1 });
    expect(r.bins[9].meanPredicted).toBeCloseTo(0.975, 15);
    expect(r.bins[9].observed).toBe(1);
    expect(r.bins[3].count).toBe(0);
    expect(Number.isNaN(r.bins[3].observed)).toBe(true);
    // ECE = 3/6 |0.04 - 1/3| + 1/6 |0.55 - 1| + 2/6 |0.975 - 1| = 0.146667 + 0.075 + 0.008333 = 0.23
    expect(r.expectedCalibrationError).toBeCloseTo(0.23, 12);
  });

  it('bins every listed hypothesis of a ranking and a left-out confirmed one at 0', () => {
    const cal = new CalibrationAccumulator(10);
    cal.addRanking(
      [
        { id: 'a', probability: 0.62 },
        { id: 'something-else', probability: 0.38 },
      ],
      w('d'),
    );
    const r = cal.result();
    expect(r.count).toBe(3);
    expect(r.bins[6]).toMatchObject({ count: 1, observed: 0 });
    expect(r.bins[3]).toMatchObject({ count: 1, observed: 0 });
    expect(r.bins[0]).toMatchObject({ count: 1, meanPredicted: 0, observed: 1 });
  });

  it('rejects a bad number of bins', () => {
    expect(() => new CalibrationAccumulator(0)).toThrow(RangeError);
  });
});

describe('symptom-cause pairs, labour and wrong-way rules', () => {
  it('counts pairs with the share of the symptom, most frequent first', () => {
    const acc = new SymptomCauseAccumulator();
    acc.add(['sym-a'], ['cause-a']);
    acc.add(['sym-a', 'sym-b', 'sym-a'], ['cause-a']);
    acc.add(['sym-a'], ['cause-b']);
    acc.add(['sym-a'], ['something-else']);
    expect(acc.result()).toEqual([
      { symptom: 'sym-a', cause: 'cause-a', outcomes: 2, shareOfSymptom: 0.5 },
      { symptom: 'sym-a', cause: 'cause-b', outcomes: 1, shareOfSymptom: 0.25 },
      { symptom: 'sym-a', cause: 'something-else', outcomes: 1, shareOfSymptom: 0.25 },
      { symptom: 'sym-b', cause: 'cause-a', outcomes: 1, shareOfSymptom: 1 },
    ]);
    expect(acc.result(1)).toHaveLength(1);
  });

  it('averages labour minutes per cause: a 30, 50, 40 -> mean 40, sd 10; b 40 -> sd undefined (NaN)', () => {
    const acc = new LabourAccumulator();
    acc.add(['a'], 30);
    acc.add(['a'], 50);
    acc.add(['a', 'b'], 40);
    acc.add(['a'], undefined);
    acc.add(['a'], -5);
    const [a, b] = acc.result();
    expect(a).toMatchObject({ cause: 'a', outcomes: 3, meanMinutes: 40, minMinutes: 30, maxMinutes: 50 });
    expect(a.sdMinutes).toBeCloseTo(10, 12);
    expect(b).toMatchObject({ cause: 'b', outcomes: 1, meanMinutes: 40 });
    expect(Number.isNaN(b.sdMinutes)).toBe(true);
  });

  it('counts a rule for a cause that was not confirmed, and a rule against a cause that was, as wrong-way', () => {
    const acc = new WrongWayRulesAccumulator(rulesetWithAgainstRule());
    acc.add(['a-points-at-a', 'a-low-band-points-at-b'], new Set(['cause-a']), 'pump-around');
    acc.add(['a-points-at-a', 'b-against-a'], new Set(['cause-a']));
    // Cause B cannot occur on a float-valve carburettor: the ranking ignored the rule, so it is not counted.
    acc.add(['a-low-band-points-at-b'], new Set(['cause-b']), 'float-valve');
    acc.add(['a-points-at-a', 'stop-on-check-b', 'renamed-rule'], new Set(['something-else']));
    const r = acc.result();
    expect(r.unknownRuleFirings).toBe(1);
    expect(r.rules.map((x) => [x.rule, x.direction, x.fired, x.wrongWay])).toEqual([
      ['a-low-band-points-at-b', 'for', 1, 1],
      ['b-against-a', 'against', 1, 1],
      ['a-points-at-a', 'for', 3, 1],
    ]);
    expect(r.rules[2].wrongWayRate).toBeCloseTo(1 / 3, 15);
  });
});

describe('insights accumulator', () => {
  const ruleset = rulesetWithAgainstRule();
  const base = { rulesetVersion: 'tiny-1', at: '2026-11-01T10:00:00Z' };
  const outcomes: OutcomeRecord[] = [
    {
      ...base,
      id: 'o1',
      caseId: 'c1',
      symptoms: [{ id: 'sym-a', band: 'closed' }],
      setup: { carburettorKind: 'pump-around' },
      openingRank: {
        causes: [
          { id: 'cause-a', probability: 0.5 },
          { id: 'cause-b', probability: 0.3 },
          { id: 'something-else', probability: 0.2 },
        ],
        firedRules: ['a-points-at-a', 'a-low-band-points-at-b'],
      },
      confirmedCauses: ['cause-a'],
      labourMinutes: 30,
      stillFixed: true,
    },
    {
      ...base,
      id: 'o2',
      symptoms: [{ id: 'sym-a' }, { id: 'sym-b' }],
      openingRank: {
        causes: [
          { id: 'cause-b', probability: 0.6 },
          { id: 'cause-a', probability: 0.3 },
          { id: 'something-else', probability: 0.1 },
        ],
        firedRules: ['a-points-at-a', 'b-against-a'],
      },
      confirmedCauses: ['cause-a'],
      labourMinutes: 50,
      stillFixed: false,
    },
    { ...base, id: 'o3', caseId: 'c3', symptoms: [{ id: 'sym-a' }], confirmedCauses: ['cause-b'], labourMinutes: 20, stillFixed: null },
    { ...base, id: 'o4', symptoms: [{ id: 'sym-b' }], confirmedCauses: ['no-such-cause'] },
  ];

  it('adds outcomes one at a time and gives every figure', () => {
    const acc = new InsightsAccumulator(ruleset, { topPairs: 10 });
    for (const o of outcomes) acc.add(o);
    const r = acc.result();
    expect(r).toMatchObject({ rulesetVersion: 'tiny-1', outcomes: 4, skipped: 1, withCase: 2, walkIns: 1, ranked: 2 });
    // o1: top-1 hit, Brier 0.25 + 0.09 + 0.04 = 0.38. o2: top-1 miss, top-3 hit, 0.36 + 0.49 + 0.01 = 0.86.
    expect(r.accuracy).toEqual({ ranked: 2, top1: 1, top3: 2, top1Rate: 0.5, top3Rate: 1, brier: expect.closeTo(0.62, 15) });
    expect(r.calibration.count).toBe(6);
    // Top-label: o1 0.5 right (bin 5), o2 0.6 wrong (bin 6).
    expect(r.topLabelCalibration.bins[5]).toMatchObject({ count: 1, observed: 1 });
    expect(r.topLabelCalibration.bins[6]).toMatchObject({ count: 1, observed: 0 });
    expect(r.confirmed).toEqual([
      { cause: 'cause-a', outcomes: 2 },
      { cause: 'cause-b', outcomes: 1 },
    ]);
    expect(r.stillFixed).toEqual({ yes: 1, no: 1, unknown: 1 });
    expect(r.labourByCause[0]).toMatchObject({ cause: 'cause-a', outcomes: 2, meanMinutes: 40 });
    expect(r.symptomCausePairs[0]).toEqual({ symptom: 'sym-a', cause: 'cause-a', outcomes: 2, shareOfSymptom: 2 / 3 });
    expect(r.wrongWayRules.rules.map((x) => x.rule)).toEqual(['a-low-band-points-at-b', 'b-against-a', 'a-points-at-a']);
  });

  it('gives the same result streamed or in one go, and can report part-way', () => {
    const acc = new InsightsAccumulator(ruleset);
    acc.add(outcomes[0]);
    expect(acc.result().outcomes).toBe(1);
    for (const o of outcomes.slice(1)) acc.add(o);
    expect(acc.result()).toEqual(computeInsights(ruleset, outcomes));
  });

  it('merges the JSON states of parts into what one pass over the whole gives', () => {
    const whole = computeInsights(ruleset, outcomes);
    // Each outcome alone, through JSON (as the stored roll-ups are), merged in reverse order.
    const merged = new InsightsAccumulator(ruleset);
    for (const o of [...outcomes].reverse()) {
      const part = new InsightsAccumulator(ruleset);
      part.add(o);
      merged.merge(JSON.parse(JSON.stringify(part.state())));
    }
    // Nothing added at all merges as nothing.
    merged.merge(new InsightsAccumulator(ruleset).state());
    const r = merged.result();
    expect(r).toEqual({ ...whole, accuracy: { ...whole.accuracy, brier: expect.closeTo(whole.accuracy.brier, 12) }, labourByCause: expect.any(Array), calibration: expect.any(Object), topLabelCalibration: expect.any(Object) });
    expect(r.calibration.bins.map((b) => b.count)).toEqual(whole.calibration.bins.map((b) => b.count));
    r.calibration.bins.forEach((b, i) => {
      if (!b.count) return;
      expect(b.meanPredicted).toBeCloseTo(whole.calibration.bins[i].meanPredicted, 12);
      expect(b.observed).toBeCloseTo(whole.calibration.bins[i].observed, 12);
    });
    expect(r.topLabelCalibration).toEqual(whole.topLabelCalibration);
    // Labour a: 30 and 50 merged pairwise (Chan, Golub and LeVeque 1979): mean 40, sd sqrt(200) = 14.142...
    const a = r.labourByCause.find((x) => x.cause === 'cause-a')!;
    expect(a).toMatchObject({ outcomes: 2, meanMinutes: 40, minMinutes: 30, maxMinutes: 50 });
    expect(a.sdMinutes).toBeCloseTo(Math.sqrt(200), 12);
    expect(r.labourByCause.map((x) => x.cause)).toEqual(whole.labourByCause.map((x) => x.cause));
  });

  it('merges labour statistics pairwise like one pass: 10, 20 | 30, 40, 50 -> mean 30, sd sqrt(250)', () => {
    // Sample variance of 10..50 step 10: sum of squared deviations 1000 over 4 = 250 (by hand).
    const left = new LabourAccumulator();
    [10, 20].forEach((m) => left.add(['x'], m));
    const right = new LabourAccumulator();
    [30, 40, 50].forEach((m) => right.add(['x'], m));
    left.merge(right.state());
    expect(left.result()[0]).toMatchObject({ outcomes: 5, meanMinutes: 30, minMinutes: 10, maxMinutes: 50 });
    expect(left.result()[0].sdMinutes).toBeCloseTo(Math.sqrt(250), 12);
  });

  it('refuses to merge the state of another ruleset version', () => {
    const other = new InsightsAccumulator(ruleset).state();
    expect(() => new InsightsAccumulator(ruleset).merge({ ...other, rulesetVersion: 'tiny-2' })).toThrow(/tiny-2/);
  });
});
