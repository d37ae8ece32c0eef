/**
 * The fired-rules scorer gives the engine's opening probabilities (the engine is the reference:
 * same ruleset, same request), so the back-test can re-rank thousands of outcomes quickly.
 */
import { describe, expect, it } from 'vitest';
import { generateOutcomes } from '../../../fixtures/generate-outcomes.js';
import { buildDiagnosisEngine } from '../engine.js';
import { createPlainEvaluator } from '../plain.js';
import { loadRuleset } from '../ruleset.js';
import { outcomeToRankRequest, rankingFromResponse, type OutcomeRecord, type RankingEntry } from './outcome.js';
import { createEngineRanker, createFiredRulesRanker, createFiredRulesScorer } from './scoring.js';

const ruleset = loadRuleset();
const engine = buildDiagnosisEngine(ruleset);
const plain = createPlainEvaluator(ruleset);
const scorer = createFiredRulesScorer(ruleset);

function expectSameRanking(a: readonly RankingEntry[], b: readonly RankingEntry[]) {
  expect(a.map((e) => e.id).sort()).toEqual(b.map((e) => e.id).sort());
  const pb = new Map(b.map((e) => [e.id, e.probability]));
  for (const e of a) expect(Math.abs(e.probability - pb.get(e.id)!)).toBeLessThan(1e-12);
}

describe('fired-rules scorer', () => {
  const outcomes = [...generateOutcomes({ count: 300, seed: 'scoring' })];

  it('gives the engine probabilities for 300 drawn outcomes (pump-around and float-valve karts)', async () => {
    expect(new Set(outcomes.map((o) => o.setup?.carburettorKind))).toEqual(new Set(['pump-around', 'float-valve']));
    for (const o of outcomes) {
      const req = outcomeToRankRequest(o);
      const res = await engine.rank(req);
      expectSameRanking(scorer.score(o, plain.firedRules(req)), rankingFromResponse(res));
    }
  }, 60_000);

  it('lists causes in the engine order, then something else', async () => {
    const o = outcomes[0];
    const res = await engine.rank(outcomeToRankRequest(o));
    const scored = scorer.score(o, o.openingRank!.firedRules);
    expect(scored.map((e) => e.id)).toEqual([...res.causes.map((c) => c.id), 'something-else']);
  });

  it('handles repeated symptoms, repeated or unknown rule names and no symptoms like the engine', async () => {
    const request = { symptoms: [{ id: 'bog-on-acceleration', band: 'closed' as const }, 'bog-on-acceleration', 'fades-after-laps'], setup: { carburettorKind: 'float-valve' as const }, asOf: '2026-11-01' };
    const fired = plain.firedRules(request);
    const res = await engine.rank(request);
    const input = { symptoms: [{ id: 'bog-on-acceleration' }, { id: 'bog-on-acceleration' }, { id: 'fades-after-laps' }], setup: request.setup };
    expectSameRanking(scorer.score(input, [...fired, fired[0], 'no-such-rule']), rankingFromResponse(res));
    const empty = await engine.rank({ symptoms: [], asOf: '2026-11-01' });
    expectSameRanking(scorer.score({ symptoms: [] }, plain.firedRules({ symptoms: [], asOf: '2026-11-01' })), rankingFromResponse(empty));
    expect(scorer.knows('no-such-rule')).toBe(false);
    expect(scorer.knows(fired[0])).toBe(true);
  });

  it('engine ranker and fired-rules ranker agree', async () => {
    const byEngine = createEngineRanker(buildDiagnosisEngine);
    const byRules = createFiredRulesRanker();
    for (const o of outcomes.slice(0, 40)) expectSameRanking(await byRules(ruleset, o), await byEngine(ruleset, o));
  }, 30_000);

  it('the fired-rules ranker refuses an outcome without fired rules', async () => {
    const o: OutcomeRecord = { id: 'x', rulesetVersion: '1.0.0', symptoms: [], confirmedCauses: ['something-else'], at: '2026-11-01T00:00:00Z' };
    await expect(createFiredRulesRanker()(ruleset, o)).rejects.toThrow(/no fired rules/);
  });
});
