/** The shipped ruleset's engine and plain evaluator for tests, built once per test file. */
import { expect } from 'vitest';
import type { RankRequest, RankResponse } from '@fuelwright/shared';
import { buildDiagnosisEngine } from '../engine.js';
import { createPlainEvaluator } from '../plain.js';
import { loadRuleset } from '../ruleset.js';

export const ruleset = loadRuleset();
export const engine = buildDiagnosisEngine(ruleset);
export const plain = createPlainEvaluator(ruleset);

/** Fixed date for foam and rebuild ages. */
export const AS_OF = '2026-12-01';

/** Ranks through the engine and checks the plain evaluator gives the same answer. */
export async function rank(request: Omit<RankRequest, 'asOf'> & { asOf?: string }): Promise<RankResponse> {
  const req = { asOf: AS_OF, ...request } as RankRequest;
  const res = await engine.rank(req);
  expect(plain.rank(req)).toEqual(res);
  return res;
}

export const ids = (res: RankResponse, n = res.causes.length) => res.causes.slice(0, n).map((c) => c.id);
export const prob = (res: RankResponse, id: string) => {
  const c = res.causes.find((x) => x.id === id);
  if (!c) throw new Error(`cause ${id} not in the response`);
  return c.probability;
};
export const rankOf = (res: RankResponse, id: string) => res.causes.findIndex((c) => c.id === id);
export const priorOf = (id: string) => ruleset.catalog.causes.find((c) => c.id === id)!.prior;
