/**
 * The invented outcome generator (fixtures/generate-outcomes.ts): reproducible, lazy, marked as
 * demo data, and its opening ranks are what the engine gives for the same requests. Its numbers
 * are invented; nothing here checks them as facts.
 */
import { describe, expect, it } from 'vitest';
import { generateOutcomes } from '../../../fixtures/generate-outcomes.js';
import demoClub from '../../../fixtures/demo-club.json' with { type: 'json' };
import { buildDiagnosisEngine } from '../engine.js';
import { createPlainEvaluator } from '../plain.js';
import { loadRuleset } from '../ruleset.js';
import { outcomeToRankRequest, rankingFromResponse } from './outcome.js';

const ruleset = loadRuleset();
const engine = buildDiagnosisEngine(ruleset);
const plain = createPlainEvaluator(ruleset);

describe('invented outcome generator', () => {
  const sample = [...generateOutcomes({ count: 400, seed: 'gen-spec' })];

  it('gives the same records for the same seed and others for another seed', () => {
    expect([...generateOutcomes({ count: 400, seed: 'gen-spec' })]).toEqual(sample);
    expect([...generateOutcomes({ count: 50, seed: 'other' })].map((o) => o.symptoms)).not.toEqual(sample.slice(0, 50).map((o) => o.symptoms));
  }, 30_000);

  it('is lazy: taking a few records of a huge count returns at once', () => {
    const it = generateOutcomes({ count: 1e9, seed: 1 });
    const first = [it.next().value, it.next().value];
    expect(first).toHaveLength(2);
  });

  it('marks every record as demo data, with unique ids, the shipped version, dates in order and a demo kart', () => {
    const karts = new Set((demoClub as { karts: { name: string }[] }).karts.map((k) => k.name));
    expect(sample.every((o) => o.demo === true && o.rulesetVersion === ruleset.version && karts.has(o.kart!))).toBe(true);
    expect(new Set(sample.map((o) => o.id)).size).toBe(sample.length);
    for (let i = 1; i < sample.length; i++) expect(sample[i].at >= sample[i - 1].at).toBe(true);
    expect(sample.every((o) => o.symptoms.length > 0 && o.confirmedCauses.length > 0)).toBe(true);
  });

  it('confirms only causes that can occur on the kart', () => {
    const kinds = new Map(ruleset.catalog.causes.map((c) => [c.id, c.carburettorKinds]));
    for (const o of sample) {
      for (const c of o.confirmedCauses) {
        const k = kinds.get(c);
        expect(c === 'something-else' || kinds.has(c)).toBe(true);
        if (k) expect(k).toContain(o.setup!.carburettorKind);
      }
    }
  });

  it('writes requests the engine accepts, the rules the plain evaluator fires, and the engine probabilities (to 4 decimals)', async () => {
    for (const o of sample.slice(0, 150)) {
      const req = outcomeToRankRequest(o);
      expect(engine.validateRankRequest(req).ok).toBe(true);
      expect(o.openingRank!.firedRules).toEqual(plain.firedRules(req));
      const expected = new Map(rankingFromResponse(await engine.rank(req)).map((e) => [e.id, e.probability]));
      for (const e of o.openingRank!.causes) expect(Math.abs(e.probability - expected.get(e.id)!)).toBeLessThanOrEqual(5e-5 + 1e-12);
      // Left out: only causes below 0.001.
      const listed = new Set(o.openingRank!.causes.map((e) => e.id));
      for (const [id, p] of expected) if (!listed.has(id)) expect(p).toBeLessThan(0.001);
    }
  }, 60_000);
});
