/**
 * Opening-rank probabilities from the rules that fired, without the rule engine.
 *
 * A refit changes only priors and likelihood ratios, never a rule's conditions, so the rules that
 * fire for an outcome are the same under the old and the proposed ruleset. The belief at case
 * open is then a pure function of the ruleset's numbers and the fired rules: prior log-odds
 * against "something else", plus ln(LR) of each fired likelihood rule, plus ln(otherCausesLr) of
 * each reported symptom for every cause no fired rule on that symptom speaks about; causes that
 * cannot occur on the carburettor kind are left out. This is the belief part of the engine's
 * response assembly (`assembleResponse` in ../core.ts) for a request without check results; the
 * tests check that both give the same probabilities. It is far cheaper than a
 * full `rank` (no validation, facts, rule evaluation or check plan), which keeps a back-test over
 * thousands of outcomes within seconds.
 */
import { SOMETHING_ELSE_ID, type RankRequest, type RankResponse } from '@fuelwright/shared';
import { priorLogOdds, probabilitiesFromLogOdds } from '../belief.js';
import { compileRuleset } from '../core.js';
import type { Ruleset } from '../model.js';
import { ensureValidated } from '../validate.js';
import { outcomeToRankRequest, rankingFromResponse, type OutcomeRecord, type RankingEntry } from './outcome.js';

/** What the scorer needs of an outcome: the reported symptoms and the carburettor kind. */
export interface ScoringInput {
  symptoms: readonly { id: string }[];
  setup?: { carburettorKind?: string };
}

export interface FiredRulesScorer {
  readonly version: string;
  /** Opening probabilities (causes most probable first, ties by id, then `something-else`). */
  score(input: ScoringInput, firedRules: readonly string[]): RankingEntry[];
  /** True when the ruleset has a rule of this name. */
  knows(rule: string): boolean;
}

export function createFiredRulesScorer(ruleset: Ruleset): FiredRulesScorer {
  const compiled = compileRuleset(ensureValidated(ruleset));
  const { catalog } = compiled;
  const elsePrior = catalog.somethingElse.prior;
  const causes = catalog.causes;
  const causeSlot = new Map(causes.map((c, i) => [c.id, i]));
  const priorLo = causes.map((c) => priorLogOdds(c.prior, elsePrior));
  const R = compiled.rules.length;
  const position = new Map(compiled.rules.map((r) => [r.def.name, r.position]));
  const ruleCause = compiled.rules.map((r) => (r.def.event.type === 'likelihood' ? causeSlot.get(r.def.event.params.cause)! : -1));
  const ruleLnLr = compiled.rules.map((r) => (r.def.event.type === 'likelihood' ? Math.log(r.def.event.params.lr) : 0));
  // Per symptom: the likelihood rules that require it (a fired one "speaks about" the symptom for its cause).
  const rulesRequiring = new Map<string, number[]>();
  compiled.rules.forEach((r) => {
    if (r.def.event.type !== 'likelihood') return;
    for (const s of r.requiresSymptoms) {
      const list = rulesRequiring.get(s);
      if (list) list.push(r.position);
      else rulesRequiring.set(s, [r.position]);
    }
  });
  const lnOther = new Map(catalog.symptoms.map((s) => [s.id, s.otherCausesLr === 1 ? 0 : Math.log(s.otherCausesLr)]));
  const eligibleFor = new Map<string, Uint8Array>();
  const eligible = (kind: string | undefined): Uint8Array => {
    const key = kind ?? '';
    let e = eligibleFor.get(key);
    if (!e) eligibleFor.set(key, (e = Uint8Array.from(causes, (c) => (!kind || !c.carburettorKinds || (c.carburettorKinds as readonly string[]).includes(kind) ? 1 : 0))));
    return e;
  };
  // Scratch space, reused by every call (score is synchronous).
  const fired = new Uint8Array(R);
  const spoken = new Uint8Array(causes.length);
  const logOdds = new Float64Array(causes.length);

  return {
    version: ruleset.version,
    knows: (rule) => position.has(rule),
    score(input, firedRules) {
      const ok = eligible(input.setup?.carburettorKind);
      const positions: number[] = [];
      for (const name of firedRules) {
        const p = position.get(name);
        if (p !== undefined && !fired[p]) {
          fired[p] = 1;
          positions.push(p);
        }
      }
      positions.sort((a, b) => a - b);
      logOdds.set(priorLo);
      for (const p of positions) {
        const i = ruleCause[p];
        if (i >= 0 && ok[i]) logOdds[i] += ruleLnLr[p];
      }
      // Reported symptoms a cause does not usually give: no fired rule on the symptom speaks for it.
      const seen = new Set<string>();
      for (const { id } of input.symptoms) {
        if (seen.has(id)) continue;
        seen.add(id);
        const l = lnOther.get(id);
        if (!l) continue;
        spoken.fill(0);
        for (const p of rulesRequiring.get(id) ?? []) if (fired[p]) spoken[ruleCause[p]] = 1;
        for (let i = 0; i < causes.length; i++) if (ok[i] && !spoken[i]) logOdds[i] += l;
      }
      for (const p of positions) fired[p] = 0;
      const slots: number[] = [];
      const lo: number[] = [];
      for (let i = 0; i < causes.length; i++) {
        if (!ok[i]) continue;
        slots.push(i);
        lo.push(logOdds[i]);
      }
      const { probabilities, somethingElse } = probabilitiesFromLogOdds(lo);
      const out: RankingEntry[] = slots.map((i, k) => ({ id: causes[i].id, probability: probabilities[k] }));
      out.sort((a, b) => b.probability - a.probability || (a.id < b.id ? -1 : 1));
      out.push({ id: SOMETHING_ELSE_ID, probability: somethingElse });
      return out;
    },
  };
}

/** Ranks one outcome under a ruleset: returns the opening probabilities (causes and `something-else`). */
export type Ranker = (ruleset: Ruleset, outcome: OutcomeRecord) => readonly RankingEntry[] | Promise<readonly RankingEntry[]>;

/** Rules that fire for an outcome under a ruleset (e.g. the engine's `firedRules`). */
export type FiredRulesSource = (ruleset: Ruleset, outcome: OutcomeRecord) => readonly string[] | undefined | Promise<readonly string[] | undefined>;

/** The fired rules stored with the outcome's opening rank. */
export const storedFiredRules: FiredRulesSource = (_ruleset, outcome) => outcome.openingRank?.firedRules;

/**
 * A ranker that scores the fired rules (stored with the outcome, or from `firedRules`) with
 * `createFiredRulesScorer`; one scorer per ruleset object. Throws for an outcome without fired
 * rules.
 */
export function createFiredRulesRanker(firedRules: FiredRulesSource = storedFiredRules): Ranker {
  const scorers = new WeakMap<Ruleset, FiredRulesScorer>();
  return async (ruleset, outcome) => {
    let scorer = scorers.get(ruleset);
    if (!scorer) scorers.set(ruleset, (scorer = createFiredRulesScorer(ruleset)));
    const fired = await firedRules(ruleset, outcome);
    if (!fired) throw new Error(`outcome ${outcome.id} has no fired rules to score`);
    return scorer.score(outcome, fired);
  };
}

/** The engine interface a ranker needs (`buildDiagnosisEngine(ruleset)` satisfies it). */
export interface RankingEngine {
  rank(request: RankRequest): RankResponse | Promise<RankResponse>;
}

/** A ranker that runs the full engine; one engine per ruleset object, built by `build`. */
export function createEngineRanker(build: (ruleset: Ruleset) => RankingEngine): Ranker {
  const engines = new WeakMap<Ruleset, RankingEngine>();
  return async (ruleset, outcome) => {
    let engine = engines.get(ruleset);
    if (!engine) engines.set(ruleset, (engine = build(ruleset)));
    return rankingFromResponse(await engine.rank(outcomeToRankRequest(outcome)));
  };
}
