/**
 * Belief maths against hand-computed examples. The numbers in the tiny ruleset are made up for
 * the arithmetic; what is checked is the maths (odds, normalisation, Bayes' rule), worked out
 * by hand in the comments.
 */
import { describe, expect, it } from 'vitest';
import { bayesUpdate, checkResultLikelihoods, checkResultLr, logSumExp, priorLogOdds, probabilitiesFromLogOdds } from './belief.js';
import { buildDiagnosisEngine } from './engine.js';
import { createPlainEvaluator } from './plain.js';
import { validateRuleset } from './validate.js';
import { tinySource } from './test-support/tiny.js';
import type { RankRequest, RankResponse } from '@fuelwright/shared';

const ruleset = validateRuleset(tinySource());
const engine = buildDiagnosisEngine(ruleset);
const plain = createPlainEvaluator(ruleset);

const p = (res: RankResponse, id: string) => res.causes.find((c) => c.id === id)!.probability;

async function both(request: RankRequest): Promise<RankResponse> {
  const a = await engine.rank(request);
  expect(plain.rank(request)).toEqual(a);
  return a;
}

describe('log-odds and normalisation', () => {
  it('log-sum-exp does not overflow', () => {
    expect(logSumExp([1000, 1000])).toBeCloseTo(1000 + Math.log(2), 12);
    expect(logSumExp([-Infinity, 0])).toBe(0);
    expect(logSumExp([])).toBe(-Infinity);
  });

  it('turns log-odds against "something else" into probabilities over causes plus something else', () => {
    // Odds 0.4 and 0.6 against something else: P = 0.4/2, 0.6/2, 1/2.
    const { probabilities, somethingElse } = probabilitiesFromLogOdds([Math.log(0.4), Math.log(0.6)]);
    expect(probabilities[0]).toBeCloseTo(0.2, 12);
    expect(probabilities[1]).toBeCloseTo(0.3, 12);
    expect(somethingElse).toBeCloseTo(0.5, 12);
    expect(priorLogOdds(0.2, 0.5)).toBeCloseTo(Math.log(0.4), 12);
  });

  it('priors alone come back as the priors when they sum to one', async () => {
    // Tiny ruleset: cause-a 0.2, cause-b 0.3, something else 0.5; sym-a's otherCausesLr is 1.
    const res = await both({ symptoms: [] });
    expect(p(res, 'cause-a')).toBeCloseTo(0.2, 12);
    expect(p(res, 'cause-b')).toBeCloseTo(0.3, 12);
    expect(res.somethingElse.probability).toBeCloseTo(0.5, 12);
  });

  it('multiplies the prior odds by the likelihood ratio of a fired rule', async () => {
    // sym-a fires LR 3 for cause-a: odds a = 0.4 * 3 = 1.2, b = 0.6, else = 1; total 2.8.
    const res = await both({ symptoms: ['sym-a'] });
    expect(p(res, 'cause-a')).toBeCloseTo(1.2 / 2.8, 12);
    expect(p(res, 'cause-b')).toBeCloseTo(0.6 / 2.8, 12);
    expect(res.somethingElse.probability).toBeCloseTo(1 / 2.8, 12);
    const reason = res.causes.find((c) => c.id === 'cause-a')!.reasons[0];
    expect(reason).toMatchObject({ kind: 'rule', ruleId: 'a-points-at-a', likelihoodRatio: 3 });
    expect(reason.logOdds).toBeCloseTo(Math.log(3), 12);
    expect(res.causes.find((c) => c.id === 'cause-a')!.logOdds).toBeCloseTo(Math.log(1.2), 12);
  });

  it('adds the band rule when the symptom shows at that band', async () => {
    // + LR 2 for cause-b: odds a 1.2, b 1.2, else 1; total 3.4.
    const res = await both({ symptoms: [{ id: 'sym-a', band: 'closed' }] });
    expect(p(res, 'cause-a')).toBeCloseTo(1.2 / 3.4, 12);
    expect(p(res, 'cause-b')).toBeCloseTo(1.2 / 3.4, 12);
    // A different band, or none, does not fire the band rule.
    const other = await both({ symptoms: [{ id: 'sym-a', band: 'three-quarters-to-full' }] });
    expect(p(other, 'cause-b')).toBeCloseTo(0.6 / 2.8, 12);
  });

  it('applies a symptom\'s otherCausesLr to causes no fired rule links with it', async () => {
    // sym-b has no rules and otherCausesLr 0.5: odds a 0.2, b 0.3, else 1; total 1.5.
    const res = await both({ symptoms: ['sym-b'] });
    expect(p(res, 'cause-a')).toBeCloseTo(0.2 / 1.5, 12);
    expect(p(res, 'cause-b')).toBeCloseTo(0.3 / 1.5, 12);
    expect(res.causes.find((c) => c.id === 'cause-a')!.reasons[0]).toMatchObject({ kind: 'unexplained', symptomId: 'sym-b', likelihoodRatio: 0.5 });
  });
});

describe("Bayes' rule on check results", () => {
  it('has the likelihoods of a test with sensitivity and specificity', () => {
    expect(checkResultLikelihoods(0.8, 0.9, 'fault-found')).toEqual({ ifTested: 0.8, ifOther: 1 - 0.9 });
    expect(checkResultLikelihoods(0.8, 0.9, 'looks-fine')).toEqual({ ifTested: 1 - 0.8, ifOther: 0.9 });
    expect(checkResultLikelihoods(0.8, 0.9, 'not-checked')).toEqual({ ifTested: 1, ifOther: 1 });
    expect(checkResultLr(0.8, 0.9, 'fault-found')).toBeCloseTo(8, 12);
    expect(checkResultLr(0.8, 0.9, 'looks-fine')).toBeCloseTo(0.2 / 0.9, 12);
  });

  it('explicit Bayes on a distribution, worked by hand', () => {
    // P = {a 0.4, b 0.4, else 0.2}; the check tests a (sens 0.8), specificity 0.9.
    // Fault found: joint a 0.32, b 0.04, else 0.02; total 0.38.
    const found = bayesUpdate({ a: 0.4, b: 0.4, else: 0.2 }, { a: 0.8 }, 0.9, 'fault-found');
    expect(found.a).toBeCloseTo(0.32 / 0.38, 12);
    expect(found.b).toBeCloseTo(0.04 / 0.38, 12);
    expect(found.else).toBeCloseTo(0.02 / 0.38, 12);
    // Looks fine: joint a 0.08, b 0.36, else 0.18; total 0.62.
    const fine = bayesUpdate({ a: 0.4, b: 0.4, else: 0.2 }, { a: 0.8 }, 0.9, 'looks-fine');
    expect(fine.a).toBeCloseTo(0.08 / 0.62, 12);
    expect(fine.b).toBeCloseTo(0.36 / 0.62, 12);
  });

  it('the engine\'s log-odds update equals explicit Bayes on its own posterior', async () => {
    const before = await both({ symptoms: ['sym-a'] });
    const dist = { 'cause-a': p(before, 'cause-a'), 'cause-b': p(before, 'cause-b'), else: before.somethingElse.probability };
    for (const result of ['fault-found', 'looks-fine'] as const) {
      const after = await both({ symptoms: ['sym-a'], results: { 'check-a': result } });
      const expected = bayesUpdate(dist, { 'cause-a': 0.8 }, 0.9, result);
      expect(p(after, 'cause-a')).toBeCloseTo(expected['cause-a'], 12);
      expect(p(after, 'cause-b')).toBeCloseTo(expected['cause-b'], 12);
      expect(after.somethingElse.probability).toBeCloseTo(expected.else, 12);
    }
    // By hand: fault found multiplies a's odds by 0.8/0.1 = 8: 9.6 / (9.6 + 0.6 + 1) = 0.857142...
    const found = await both({ symptoms: ['sym-a'], results: { 'check-a': 'fault-found' } });
    expect(p(found, 'cause-a')).toBeCloseTo(9.6 / 11.2, 12);
    expect(found.causes[0].reasons.find((r) => r.kind === 'check')).toMatchObject({ checkId: 'check-a', text: 'Check A: fault found' });
  });

  it('"could not check" changes no probability but takes the check off the plan', async () => {
    const before = await both({ symptoms: ['sym-a'] });
    const after = await both({ symptoms: ['sym-a'], results: { 'check-a': 'not-checked' } });
    expect(after.causes).toEqual(before.causes);
    expect(before.plan.map((s) => s.checkId)).toContain('check-a');
    expect(after.plan.map((s) => s.checkId)).not.toContain('check-a');
  });
});

describe('plan, exclusion and stop on the tiny ruleset', () => {
  it('orders by probability over cost with the group opening counted, and gives the expected minutes', async () => {
    // P(a) = 3/7, P(b) = 3/14. check-a: p = 3/7 * 0.8 = 0.342857, 2 min outside (ef 0.171).
    // check-b: p = 3/14 * 0.9 = 0.192857, 3 min + 8 to open the float bowl (ef 0.0175).
    // Expected minutes = 2 + 11 * (1 - 0.342857) = 9.228571...
    const res = await both({ symptoms: ['sym-a'] });
    expect(res.plan.map((s) => [s.checkId, s.openingMinutes])).toEqual([
      ['check-a', 0],
      ['check-b', 8],
    ]);
    expect(res.plan[0].findProbability).toBeCloseTo((3 / 7) * 0.8, 12);
    expect(res.expectedMinutes).toBeCloseTo(2 + 11 * (1 - (3 / 7) * 0.8), 10);
    expect(res.plan[1].cautions.map((c) => c.id)).toEqual(['fuel-flammable']);
  });

  it('leaves out causes that cannot occur on the carburettor kind, and their checks', async () => {
    const res = await both({ symptoms: ['sym-a'], setup: { carburettorKind: 'float-valve' } });
    expect(res.causes.map((c) => c.id)).toEqual(['cause-a']);
    expect(res.excluded).toEqual([{ id: 'cause-b', label: 'Cause B', reason: 'Not found on a float-valve carburettor' }]);
    expect(res.plan.map((s) => s.checkId)).toEqual(['check-a']);
    // Odds a 1.2 against else 1.
    expect(p(res, 'cause-a')).toBeCloseTo(1.2 / 2.2, 12);
  });

  it('a stop finding ends the plan and carries the stop advice', async () => {
    const res = await both({ symptoms: ['sym-b'], results: { 'check-b': 'fault-found' } });
    expect(res.stop).toEqual({ reason: 'Check B found it. Do not drive; see a qualified engine builder.', checkId: 'check-b', ruleId: 'stop-on-check-b' });
    expect(res.plan).toEqual([]);
    expect(res.cautions.map((c) => c.id)).toEqual(['throttle-stop']);
  });
});
