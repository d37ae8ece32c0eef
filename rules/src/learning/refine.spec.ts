/**
 * The refinement end to end: hand-computed small cases on the tiny test ruleset (the numbers in
 * it are made up for the arithmetic, not trade knowledge), the back-test split, progress, and
 * the engine as the back-test ranker. Worked arithmetic is written beside each check.
 */
import { describe, expect, it } from 'vitest';
import { generateOutcomes } from '../../../fixtures/generate-outcomes.js';
import { buildDiagnosisEngine } from '../engine.js';
import type { Ruleset } from '../model.js';
import { loadRuleset } from '../ruleset.js';
import { tinySource } from '../test-support/tiny.js';
import { validateRuleset } from '../validate.js';
import type { OutcomeRecord, RankingEntry } from './outcome.js';
import { isHeldOut } from './random.js';
import { proposeRuleset, roundSignificant } from './refine.js';
import { createEngineRanker } from './scoring.js';

const tiny = validateRuleset(tinySource()); // priors: cause-a 0.2, cause-b 0.3 (pump-around only), something else 0.5

/** The tiny ruleset with a child rule of a-points-at-a: symptom A at closed throttle, LR 1.5. */
function tinyWithChild(): Ruleset {
  const src = tinySource();
  (src.ruleFiles['rules/tiny.json'] as { rules: unknown[] }).rules.push({
    name: 'a-closed-points-at-a',
    conditions: { all: [{ fact: 'symptoms', operator: 'shows', value: { symptom: 'sym-a', band: ['closed'] } }] },
    event: { type: 'likelihood', params: { cause: 'cause-a', lr: 1.5, reason: 'A at closed throttle points at cause A.' } },
  });
  return validateRuleset(src);
}

let n = 0;
function outcome(confirmed: string[], firedRules: string[] | undefined, extra: Partial<OutcomeRecord> = {}): OutcomeRecord {
  n++;
  return {
    id: `o-${n}`,
    rulesetVersion: 'tiny-1',
    symptoms: [{ id: 'sym-a', band: 'closed' }],
    ...(firedRules ? { openingRank: { causes: [], firedRules } } : {}),
    confirmedCauses: confirmed,
    at: '2026-11-01T10:00:00Z',
    ...extra,
  };
}
const times = (k: number, make: () => OutcomeRecord) => Array.from({ length: k }, make);

describe('proposeRuleset: hand-computed small case', () => {
  const A = 'a-points-at-a';
  const B = 'a-low-band-points-at-b';
  const outcomes = [
    ...times(3, () => outcome(['cause-a'], [A])),
    outcome(['cause-a'], []),
    ...times(2, () => outcome(['cause-b'], [A, B])),
    outcome(['something-else'], [A]),
    ...times(3, () => outcome(['something-else'], [])),
  ];

  it('updates the priors as Dirichlet(10 x (0.2, 0.3, 0.5)) + counts (4, 2, 4) = (6, 5, 9): means 0.3, 0.25, 0.45', async () => {
    const p = await proposeRuleset(tiny, outcomes, { version: 'tiny-2', strength: 10, holdOutFraction: 0 });
    expect(p.priors.map((x) => [x.cause, x.old, x.proposed, x.changed])).toEqual([
      ['cause-a', 0.2, 0.3, true],
      ['cause-b', 0.3, 0.25, true],
      ['something-else', 0.5, 0.45, true],
    ]);
    expect(p.priors.map((x) => x.evidence.outcomes)).toEqual([4, 2, 4]);
    expect(p.priors[0].evidence.posterior).toEqual({ alpha: 6, beta: 14 });
    // SciPy 1.17.1 scipy.stats.beta.ppf(0.05 / 0.95, ...) of Beta(6,14), Beta(5,15), Beta(9,11) (the old priors sum to 1, so the scale is 1).
    const intervals = p.priors.map((x) => x.evidence.interval);
    expect(intervals[0][0]).toBeCloseTo(0.147469565559241, 10);
    expect(intervals[0][1]).toBeCloseTo(0.47579711042141004, 10);
    expect(intervals[1][0]).toBeCloseTo(0.1099063700051813, 10);
    expect(intervals[1][1]).toBeCloseTo(0.4191202289169427, 10);
    expect(intervals[2][0]).toBeCloseTo(0.2739458450823201, 10);
    expect(intervals[2][1]).toBeCloseTo(0.6318847929794846, 10);
    // Old values 0.2, 0.3, 0.5 all lie inside their intervals.
    expect(p.priors.map((x) => x.evidence.oldOutsideInterval)).toEqual([false, false, false]);
  });

  it('updates the ratios (strength 10: cause A weighs 2, cause B 3, something else 5 pseudo-outcomes)', async () => {
    // Outcomes: A x10 (A-rule fired in 4), B x10 (both rules fired in 6), something else x20 (both in 1, A-rule alone in 1).
    // a-points-at-a: pooled 12 of 40 -> f = 12.5/41; b = (5f + 2)/25; m = 3b; E[P(fires | A)] = (2m + 4)/12.
    // a-low-band-points-at-b: pooled 7 of 40 -> f = 7.5/41; b = (5f + 1)/25; m = 2b; E[P(fires | B)] = (3m + 6)/13.
    const data = [
      ...times(4, () => outcome(['cause-a'], [A])),
      ...times(6, () => outcome(['cause-a'], [])),
      ...times(6, () => outcome(['cause-b'], [A, B])),
      ...times(4, () => outcome(['cause-b'], [])),
      outcome(['something-else'], [A, B]),
      outcome(['something-else'], [A]),
      ...times(18, () => outcome(['something-else'], [])),
    ];
    const p = await proposeRuleset(tiny, data, { version: 'tiny-2', strength: 10, holdOutFraction: 0 });
    const [a, b] = p.rules;
    const bA = ((5 * 12.5) / 41 + 2) / 25;
    const aA = (2 * 3 * bA + 4) / 12;
    const bB = ((5 * 7.5) / 41 + 1) / 25;
    const aB = (3 * 2 * bB + 6) / 13;
    expect(a.evidence).toMatchObject({ causeOutcomes: 10, causeFired: 4, referenceOutcomes: 20, referenceFired: 2, pooledOutcomes: 40, pooledFired: 12, outcomes: 30, parents: [], capped: false, kept: false, flat: false });
    expect(a.evidence.pFiresIfReference).toBeCloseTo(bA, 12);
    expect(a.evidence.pFiresIfCause).toBeCloseTo(aA, 12);
    expect([a.rule, a.old, a.proposed]).toEqual([A, 3, roundSignificant(aA / bA)]);
    expect(a.proposed).toBe(2.86); // 0.40382 / 0.14098
    expect(b.evidence).toMatchObject({ causeOutcomes: 10, causeFired: 6, referenceOutcomes: 20, referenceFired: 1, pooledOutcomes: 40, pooledFired: 7 });
    expect([b.rule, b.old, b.proposed]).toEqual([B, 2, roundSignificant(aB / bB)]);
    expect(b.proposed).toBe(6.49); // 0.49689 / 0.076585
    expect(a.evidence.interval[0]).toBeLessThan(a.proposed);
    expect(a.evidence.interval[1]).toBeGreaterThan(a.proposed);
    // Ten outcomes of each cause: 3 stays inside A's wide interval; B fired in 6 of 10 against 1 of 20, so 2 is below B's.
    expect(a.evidence.oldOutsideInterval).toBe(false);
    expect(b.evidence.interval[0]).toBeGreaterThan(2);
    expect(b.evidence.oldOutsideInterval).toBe(true);
    expect(p.changedRules).toBe(2);
  });

  it('builds the new version with those numbers, conditions untouched, and an engine takes it', async () => {
    const p = await proposeRuleset(tiny, outcomes, { version: 'tiny-2', strength: 10, holdOutFraction: 0 });
    expect(p.version).toBe('tiny-2');
    expect(p.fromVersion).toBe('tiny-1');
    expect(p.ruleset.version).toBe('tiny-2');
    expect(p.ruleset.catalog.causes.map((c) => c.prior)).toEqual([0.3, 0.25]);
    expect(p.ruleset.catalog.somethingElse.prior).toBe(0.45);
    expect(p.ruleset.rules.map((r) => r.conditions)).toEqual(tiny.rules.map((r) => r.conditions));
    expect(p.ruleset.rules.map((r) => (r.event.type === 'likelihood' ? r.event.params.lr : r.event.type))).toEqual([p.rules[0].proposed, p.rules[1].proposed, 'stop']);
    expect(p.rules[0].proposed).not.toBe(3);
    expect(validateRuleset(p.source).version).toBe('tiny-2');
    const res = await buildDiagnosisEngine(p.ruleset).rank({ symptoms: [] });
    expect(res.version).toBe('tiny-2');
    // The old ruleset is untouched.
    expect(tiny.catalog.causes[0].prior).toBe(0.2);
  });

  it('estimates a child rule only where its parent fired: 2 of 3 and 1 of 2 -> LR 1.31', async () => {
    // Parent fired in 5 outcomes (A: 3, something else: 2); the child in 3 of them -> f = 3.5/6.
    // b = (5f + 1)/(5 + 2); m = 1.5 b; E[P(child | A, parent)] = (2m + 2)/(2 + 3) -> 0.73571 / 0.55952 = 1.31.
    const C = 'a-closed-points-at-a';
    const data = [
      ...times(2, () => outcome(['cause-a'], [A, C])),
      outcome(['cause-a'], [A]),
      outcome(['cause-a'], []),
      outcome(['something-else'], [A, C]),
      outcome(['something-else'], [A]),
      ...times(2, () => outcome(['something-else'], [])),
    ];
    const p = await proposeRuleset(tinyWithChild(), data, { version: 'tiny-2', strength: 10, holdOutFraction: 0 });
    const child = p.rules.find((r) => r.rule === C)!;
    expect(child.evidence).toMatchObject({ parents: [A], causeOutcomes: 3, causeFired: 2, referenceOutcomes: 2, referenceFired: 1, pooledOutcomes: 5, pooledFired: 3 });
    const b = ((5 * 3.5) / 6 + 1) / 7;
    expect(child.evidence.pFiresIfCause).toBeCloseTo((2 * 1.5 * b + 2) / 5, 12);
    expect(child.proposed).toBe(1.31);
  });
});

describe('proposeRuleset: data handling', () => {
  it('changes nothing without outcomes, and the new version ranks like the old', async () => {
    const p = await proposeRuleset(tiny, [], { version: 'tiny-2', strength: 50 });
    expect(p.changedPriors).toBe(0);
    expect(p.changedRules).toBe(0);
    expect(p.priors.every((x) => x.proposed === x.old)).toBe(true);
    expect(p.backTest).toMatchObject({ heldOut: 0, scored: 0 });
  });

  it('does not shrink a cause that cannot occur on some karts (data drawn exactly from the priors; by construction)', async () => {
    // Pump-around karts: 20 A, 30 B, 50 something else. Float-valve karts (B cannot occur): 20 A, 50 something else.
    const pump = { setup: { carburettorKind: 'pump-around' as const } };
    const fv = { setup: { carburettorKind: 'float-valve' as const } };
    const data = [
      ...times(20, () => outcome(['cause-a'], undefined, pump)),
      ...times(30, () => outcome(['cause-b'], undefined, pump)),
      ...times(50, () => outcome(['something-else'], undefined, pump)),
      ...times(20, () => outcome(['cause-a'], undefined, fv)),
      ...times(50, () => outcome(['something-else'], undefined, fv)),
    ];
    const p = await proposeRuleset(tiny, data, { version: 'tiny-2', strength: 10, holdOutFraction: 0 });
    expect(p.priors.map((x) => x.proposed)).toEqual([0.2, 0.3, 0.5]);
    expect(p.priors[1].evidence.imputed).toBeCloseTo(30, 6);
    expect(p.fit).toMatchObject({ outcomes: 170, withFiredRules: 0 });
    expect(p.changedRules).toBe(0);
  });

  it('leaves out fixes that did not hold (unless asked) and causes it does not know', async () => {
    const data = [outcome(['cause-a'], [], { stillFixed: false }), outcome(['cause-a'], [], { stillFixed: null }), outcome(['no-such-cause'], []), outcome(['cause-b', 'no-such-cause'], [])];
    const p = await proposeRuleset(tiny, data, { version: 'tiny-2', strength: 10, holdOutFraction: 0 });
    expect(p.fit).toMatchObject({ read: 4, outcomes: 2, skipped: { noKnownCause: 1, notStillFixed: 1 } });
    expect(p.priors.map((x) => x.evidence.outcomes)).toEqual([1, 1, 0]);
    const all = await proposeRuleset(tiny, data, { version: 'tiny-2', strength: 10, holdOutFraction: 0, includeNotStillFixed: true });
    expect(all.fit.outcomes).toBe(3);
  });

  it('splits an outcome with two confirmed causes half and half', async () => {
    const p = await proposeRuleset(tiny, [outcome(['cause-a', 'cause-b'], [])], { version: 'tiny-2', strength: 10, holdOutFraction: 0 });
    expect(p.priors.map((x) => x.evidence.weight)).toEqual([0.5, 0.5, 0]);
    expect(p.priors.map((x) => x.evidence.outcomes)).toEqual([1, 1, 0]);
  });

  it('rejects a strength that is not positive and a hold-out fraction outside [0, 1)', async () => {
    await expect(proposeRuleset(tiny, [], { version: 'tiny-2', strength: 0 })).rejects.toThrow(RangeError);
    await expect(proposeRuleset(tiny, [], { version: 'tiny-2', strength: 1, holdOutFraction: 1 })).rejects.toThrow(RangeError);
  });

  it('rejects a version string the catalog schema does not accept', async () => {
    await expect(proposeRuleset(tiny, [], { version: 'not a version!', strength: 1 })).rejects.toThrow(/version/);
  });

  it('rounds to three significant digits', () => {
    expect(roundSignificant(2.66666)).toBe(2.67);
    expect(roundSignificant(0.0123456)).toBe(0.0123);
    expect(roundSignificant(14.96)).toBe(15);
  });
});

describe('proposeRuleset: back-test', () => {
  const many = Array.from({ length: 200 }, (_, i) => outcome(['cause-a'], [], { id: `bt-${i}` }));

  /** A fake engine: the old ruleset puts "something else" first, the new one cause A. */
  function fakeRanker(calls: string[]) {
    return (ruleset: Ruleset, o: OutcomeRecord): RankingEntry[] => {
      calls.push(`${ruleset.version}:${o.id}`);
      return ruleset.version === 'tiny-1'
        ? [
            { id: 'something-else', probability: 1 },
            { id: 'cause-a', probability: 0 },
          ]
        : [
            { id: 'cause-a', probability: 0.8 },
            { id: 'something-else', probability: 0.2 },
          ];
    };
  }

  it('ranks exactly the held-out outcomes under both rulesets and scores them before and after', async () => {
    const calls: string[] = [];
    const p = await proposeRuleset(tiny, many, { version: 'tiny-2', strength: 10, seed: 5, holdOutFraction: 0.3, rank: fakeRanker(calls) });
    const held = many.filter((o) => isHeldOut(o.id, 5, 0.3)).map((o) => o.id);
    expect(held.length).toBeGreaterThan(30);
    expect(p.backTest.heldOut).toBe(held.length);
    expect(p.fit.outcomes).toBe(200 - held.length);
    expect(calls.sort()).toEqual([...held.map((id) => `tiny-1:${id}`), ...held.map((id) => `tiny-2:${id}`)].sort());
    // Before: top-1 never, top-3 always (cause A is second), Brier 1 + 1 = 2. After: top-1 always, Brier 0.04 + 0.04 = 0.08.
    expect(p.backTest.before).toMatchObject({ ranked: held.length, top1Rate: 0, top3Rate: 1, brier: 2 });
    expect(p.backTest.after.top1Rate).toBe(1);
    expect(p.backTest.after.brier).toBeCloseTo(0.08, 12);
  });

  it('is deterministic for a seed, moves with the seed, and keeps old outcomes on their side when new ones arrive', async () => {
    const heldIds = async (data: OutcomeRecord[], seed: number) => {
      const calls: string[] = [];
      await proposeRuleset(tiny, data, { version: 'tiny-2', strength: 10, seed, holdOutFraction: 0.3, rank: fakeRanker(calls) });
      return calls.filter((c) => c.startsWith('tiny-1:')).map((c) => c.slice(7));
    };
    const first = await heldIds(many, 5);
    expect(await heldIds(many, 5)).toEqual(first);
    expect(await heldIds(many, 6)).not.toEqual(first);
    const grown = [...Array.from({ length: 100 }, (_, i) => outcome(['cause-a'], [], { id: `new-${i}` })), ...many];
    const after = await heldIds(grown, 5);
    expect(after.filter((id) => id.startsWith('bt-')).sort()).toEqual([...first].sort());
  });

  it('reports progress from 0 to 1, in order, awaiting each report', async () => {
    const seen: number[] = [];
    let pending = 0;
    let overlapped = false;
    await proposeRuleset(tiny, many, {
      version: 'tiny-2',
      strength: 10,
      holdOutFraction: 0.5,
      rank: fakeRanker([]),
      onProgress: async (f) => {
        if (pending) overlapped = true;
        pending++;
        seen.push(f);
        await new Promise((r) => setTimeout(r, 0));
        pending--;
      },
    });
    expect(seen[0]).toBe(0);
    expect(seen.at(-1)).toBe(1);
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThanOrEqual(seen[i - 1]);
    expect(seen.length).toBeGreaterThan(10);
    expect(seen.length).toBeLessThan(250);
    expect(overlapped).toBe(false);
  });

  it('reads an async stream like an array', async () => {
    async function* stream() {
      for (const o of many) yield o;
    }
    const a = await proposeRuleset(tiny, many, { version: 'tiny-2', strength: 10, seed: 3, rank: fakeRanker([]) });
    const b = await proposeRuleset(tiny, stream(), { version: 'tiny-2', strength: 10, seed: 3, rank: fakeRanker([]), total: many.length });
    expect(b.priors).toEqual(a.priors);
    expect(b.backTest).toEqual(a.backTest);
  });
});

describe('proposeRuleset on the shipped ruleset and invented outcomes', () => {
  const shipped = loadRuleset();

  it('gives the same back-test with the engine as the ranker as with the fired rules', async () => {
    const data = [...generateOutcomes({ count: 160, seed: 'refine-engine' })];
    const options = { version: '1.0.1', strength: 100, seed: 2, holdOutFraction: 0.4 };
    const byRules = await proposeRuleset(shipped, data, options);
    const byEngine = await proposeRuleset(shipped, data, { ...options, rank: createEngineRanker(buildDiagnosisEngine) });
    expect(byEngine.backTest.heldOut).toBe(byRules.backTest.heldOut);
    expect(byEngine.backTest.before.top3).toBe(byRules.backTest.before.top3);
    expect(byEngine.backTest.after.top3).toBe(byRules.backTest.after.top3);
    expect(byEngine.backTest.before.brier).toBeCloseTo(byRules.backTest.before.brier, 10);
    expect(byEngine.backTest.after.brier).toBeCloseTo(byRules.backTest.after.brier, 10);
  }, 60_000);

  it('learns from a world that differs from its numbers: the held-out Brier score improves (invented data; checks the update, not the trade)', async () => {
    const data = generateOutcomes({ count: 6000, seed: 'refine-learns', drift: 0.5 });
    const p = await proposeRuleset(shipped, data, { version: '1.0.1', strength: 100, seed: 9, holdOutFraction: 0.3, total: 6000 });
    expect(p.backTest.scored).toBe(p.backTest.heldOut);
    expect(p.backTest.after.brier).toBeLessThan(p.backTest.before.brier);
    expect(p.changedPriors).toBeGreaterThan(20);
    // With 4,200 outcomes from a world a factor of e^0.5 away, the data contradict many expert numbers.
    expect(p.priors.filter((x) => x.evidence.oldOutsideInterval).length).toBeGreaterThan(5);
    expect(p.ruleset.version).toBe('1.0.1');
  }, 60_000);
});
