/**
 * Refinement: new cause priors and rule likelihood ratios from outcomes, by Bayesian updating
 * with the current (expert) values as the prior, and a back-test on outcomes held out of the fit.
 * The maths is set out in README.md in this folder. Pure: the caller streams the outcomes in
 * and, for the back-test, may supply the engine (`rank`); nothing here does I/O.
 */
import { SOMETHING_ELSE_ID } from '@fuelwright/shared';
import type { Ruleset, RulesetSource } from '../model.js';
import { toRulesetSource, validateRuleset } from '../validate.js';
import { betaCredibleInterval, betaMean, dirichletMarginal, estimateLikelihoodRatio, fitTruncatedDirichlet, ratioInterval, type BetaParams } from './bayes.js';
import { ruleParents } from './implication.js';
import { AccuracyAccumulator, type RankingAccuracy } from './metrics.js';
import { confirmedWeights, type OutcomeRecord } from './outcome.js';
import { isHeldOut } from './random.js';
import { createFiredRulesScorer, storedFiredRules, type FiredRulesSource, type Ranker } from './scoring.js';

/** Bounds the ruleset schema puts on a likelihood ratio and on a prior. */
export const LR_BOUNDS = { min: 0.01, max: 100 } as const;
export const PRIOR_BOUNDS = { min: 0.0001, max: 0.999 } as const;
/** Significant digits kept in proposed values. */
export const SIGNIFICANT_DIGITS = 3;

export interface ProposeOptions {
  /** Version string of the proposed ruleset (the catalog's `version`). */
  version: string;
  /**
   * How many outcomes the expert values weigh (> 0): the Dirichlet prior on the causes has this
   * total, and a rule's priors on P(fires | its cause) and P(fires | something else) weigh
   * strength x the expert share of the cause and of "something else".
   */
  strength: number;
  /** Seed of the hold-out split and of the Monte Carlo intervals (default 1). */
  seed?: number | string;
  /** Share of outcomes held out of the fit for the back-test, in [0, 1) (default 0.2). */
  holdOutFraction?: number;
  /**
   * Ranks a held-out outcome under a ruleset (the engine). Default: the fired rules (from
   * `firedRules`) scored under each ruleset, which gives the engine's opening probabilities.
   */
  rank?: Ranker;
  /** Rules that fire for an outcome (default: those stored with its opening rank). */
  firedRules?: FiredRulesSource;
  /**
   * Called with the fraction done (0..1), at most about every 1 %, and with 1 at the end. A
   * returned promise is awaited, which lets the caller yield to its event loop.
   */
  onProgress?: (fractionDone: number) => void | Promise<void>;
  /** Number of outcomes expected, for progress during the fit when `outcomes` is a stream. */
  total?: number;
  /** Use outcomes whose fix did not hold (`stillFixed: false`) too (default false: left out). */
  includeNotStillFixed?: boolean;
  /** Credible interval mass (default 0.9). */
  intervalMass?: number;
  /** Monte Carlo draws per likelihood-ratio interval (default 2000). */
  draws?: number;
}

export interface PriorProposal {
  /** Cause id, or `something-else`. */
  cause: string;
  old: number;
  proposed: number;
  changed: boolean;
  evidence: {
    /** Fit outcomes confirming it (an outcome with two causes counts for both). */
    outcomes: number;
    /** The same, each outcome weighing 1/m over its m confirmed causes. */
    weight: number;
    /** Expected confirmations added for karts on which it cannot occur (see README). */
    imputed: number;
    /** Marginal posterior Beta of its share among all hypotheses. */
    posterior: BetaParams;
    /** Credible interval of the prior, on the same scale as `old` and `proposed`. */
    interval: [number, number];
    /** The old value lies outside the credible interval: the outcomes disagree with it. */
    oldOutsideInterval: boolean;
  };
}

export interface RuleProposal {
  rule: string;
  file: string;
  cause: string;
  old: number;
  proposed: number;
  changed: boolean;
  evidence: {
    /** Outcomes that informed the ratio (of its cause or of "something else", with its parents fired). */
    outcomes: number;
    /** Outcomes of its cause (weighted 1/m), and of those where it fired. */
    causeOutcomes: number;
    causeFired: number;
    /** Outcomes of "something else" (weighted 1/m), and of those where it fired. */
    referenceOutcomes: number;
    referenceFired: number;
    /** All outcomes where it could fire (parents fired), and of those where it fired: the prior's base rate. */
    pooledOutcomes: number;
    pooledFired: number;
    /** Rules for the same cause that always fire with it; the ratio is estimated where they fired. */
    parents: string[];
    /** Credible interval of the ratio (Monte Carlo). */
    interval: [number, number];
    /** The old ratio lies outside the credible interval: the outcomes disagree with it (false when kept). */
    oldOutsideInterval: boolean;
    /** Posterior means of P(fires | cause) and P(fires | something else). */
    pFiresIfCause: number;
    pFiresIfReference: number;
    /** The expert ratio times the base rate was held at the cap (see README). */
    capped: boolean;
    /** No outcome of its cause was seen: the expert's ratio is kept. */
    kept: boolean;
    /** The estimate rounded to 1, which a rule may not carry: nudged to 1.01 or 0.99 (a candidate for removal). */
    flat: boolean;
  };
}

export interface BackTest {
  /** Outcomes held out of the fit. */
  heldOut: number;
  /** Held-out outcomes ranked under both rulesets. */
  scored: number;
  /** Held-out outcomes that could not be ranked (no fired rules with the default ranker). */
  skipped: number;
  before: RankingAccuracy;
  after: RankingAccuracy;
}

export interface RulesetProposal {
  fromVersion: string;
  version: string;
  /** The re-fitted ruleset (validated; conditions unchanged). */
  ruleset: Ruleset;
  /** Its JSON files, to store. */
  source: RulesetSource;
  /** Catalog causes in catalog order, then `something-else`. */
  priors: PriorProposal[];
  /** Likelihood rules in ruleset order. */
  rules: RuleProposal[];
  changedPriors: number;
  changedRules: number;
  fit: {
    /** Outcomes read. */
    read: number;
    /** Outcomes the priors were fitted on. */
    outcomes: number;
    /** Of those, outcomes with fired rules (the ratios were fitted on these). */
    withFiredRules: number;
    skipped: { noKnownCause: number; notStillFixed: number };
  };
  backTest: BackTest;
  settings: { strength: number; seed: number | string; holdOutFraction: number; intervalMass: number; draws: number };
}

/** x rounded to `digits` significant digits. */
export function roundSignificant(x: number, digits = SIGNIFICANT_DIGITS): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  const scale = Math.pow(10, digits - 1 - Math.floor(Math.log10(Math.abs(x))));
  return Math.round(x * scale) / scale;
}

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));

function progressReporter(callback: ProposeOptions['onProgress']) {
  let last = -1;
  return async (fraction: number, force = false) => {
    if (!callback) return;
    const f = clamp(fraction, 0, 1);
    if (force || f - last >= 0.01) {
      last = f;
      await callback(f);
    }
  };
}

/** Share of the progress bar for the fit (when the number of outcomes is known) and for the estimates. */
const FIT_END = 0.3;
const ESTIMATE_END = 0.4;

/**
 * Proposes a new ruleset version from outcomes: re-fitted priors and likelihood ratios, each with
 * its evidence, and a back-test on the held-out outcomes (top-1, top-3 and Brier score before and
 * after). Outcomes may be an array or any (async) iterable; only the held-out ones are kept in
 * memory.
 */
export async function proposeRuleset(
  ruleset: Ruleset,
  outcomes: Iterable<OutcomeRecord> | AsyncIterable<OutcomeRecord>,
  options: ProposeOptions,
): Promise<RulesetProposal> {
  const strength = options.strength;
  if (!(strength > 0) || !Number.isFinite(strength)) throw new RangeError(`strength must be a finite number > 0 (got ${strength})`);
  const seed = options.seed ?? 1;
  const holdOutFraction = options.holdOutFraction ?? 0.2;
  if (!(holdOutFraction >= 0 && holdOutFraction < 1)) throw new RangeError(`holdOutFraction must be in [0, 1) (got ${holdOutFraction})`);
  const intervalMass = options.intervalMass ?? 0.9;
  const draws = options.draws ?? 2000;
  const firedRulesOf = options.firedRules ?? storedFiredRules;
  const progress = progressReporter(options.onProgress);
  const total = Array.isArray(outcomes) ? outcomes.length : options.total;

  // Hypotheses: the catalog causes, then "something else" (last).
  const { catalog } = ruleset;
  const classes = [...catalog.causes.map((c) => c.id), SOMETHING_ELSE_ID];
  const K = classes.length;
  const ELSE = K - 1;
  const slot = new Map(classes.map((id, i) => [id, i]));
  const oldPriors = [...catalog.causes.map((c) => c.prior), catalog.somethingElse.prior];
  const priorScale = oldPriors.reduce((s, p) => s + p, 0);
  const expertShare = oldPriors.map((p) => p / priorScale);
  const possibleByKind = new Map<string, boolean[]>();
  const possibleFor = (kind: string | undefined): boolean[] => {
    const key = kind ?? '';
    let mask = possibleByKind.get(key);
    if (!mask) {
      mask = classes.map((_, i) => i === ELSE || !kind || !catalog.causes[i].carburettorKinds || (catalog.causes[i].carburettorKinds as readonly string[]).includes(kind));
      possibleByKind.set(key, mask);
    }
    return mask;
  };

  // Likelihood rules, their cause slots and parents.
  const parentsByName = ruleParents(ruleset.rules);
  const lrRules = ruleset.rules.filter((r) => r.event.type === 'likelihood');
  const R = lrRules.length;
  const ruleIndex = new Map(lrRules.map((r, j) => [r.name, j]));
  const ruleCause = lrRules.map((r) => slot.get((r.event.params as { cause: string }).cause)!);
  const ruleParentIdx = lrRules.map((r) => (parentsByName.get(r.name) ?? []).map((n) => ruleIndex.get(n)!));
  const rulesByCause: number[][] = classes.map(() => []);
  lrRules.forEach((_, j) => rulesByCause[ruleCause[j]].push(j));

  // Counters.
  const groups = new Map<string, { possible: boolean[]; counts: number[] }>();
  const outcomesByClass = new Array<number>(K).fill(0);
  const nC = new Float64Array(R);
  const kC = new Float64Array(R);
  const n0 = new Float64Array(R);
  const k0 = new Float64Array(R);
  const nAll = new Float64Array(R);
  const kAll = new Float64Array(R);
  const supportC = new Uint32Array(R);
  const support0 = new Uint32Array(R);
  const fired = new Uint8Array(R);
  const heldOut: { outcome: OutcomeRecord; targets: Map<string, number> }[] = [];
  let read = 0;
  let fitted = 0;
  let withFired = 0;
  let noKnownCause = 0;
  let notStillFixed = 0;

  const parentsFired = (j: number) => {
    for (const p of ruleParentIdx[j]) if (!fired[p]) return false;
    return true;
  };

  await progress(0, true);
  for await (const outcome of outcomes) {
    read++;
    if (total) await progress((FIT_END * read) / total);
    const targets = confirmedWeights(outcome.confirmedCauses, (id) => slot.has(id));
    if (targets.size === 0) {
      noKnownCause++;
      continue;
    }
    if (outcome.stillFixed === false && !options.includeNotStillFixed) {
      notStillFixed++;
      continue;
    }
    if (isHeldOut(outcome.id, seed, holdOutFraction)) {
      heldOut.push({ outcome, targets });
      continue;
    }
    fitted++;
    // A confirmed cause that cannot occur on the recorded kind: take the kind as unknown.
    let kind = outcome.setup?.carburettorKind as string | undefined;
    let possible = possibleFor(kind);
    for (const id of targets.keys()) if (!possible[slot.get(id)!]) kind = undefined;
    possible = possibleFor(kind);
    const key = kind ?? '';
    let group = groups.get(key);
    if (!group) groups.set(key, (group = { possible, counts: new Array<number>(K).fill(0) }));
    for (const [id, y] of targets) {
      const k = slot.get(id)!;
      group.counts[k] += y;
      outcomesByClass[k]++;
    }

    const names = await firedRulesOf(ruleset, outcome);
    if (!names) continue;
    withFired++;
    const set: number[] = [];
    for (const name of names) {
      const j = ruleIndex.get(name);
      if (j !== undefined && !fired[j]) {
        fired[j] = 1;
        set.push(j);
      }
    }
    const yElse = targets.get(SOMETHING_ELSE_ID) ?? 0;
    for (let j = 0; j < R; j++) {
      if (!possible[ruleCause[j]] || !parentsFired(j)) continue;
      nAll[j]++;
      if (fired[j]) kAll[j]++;
      if (yElse > 0) {
        n0[j] += yElse;
        support0[j]++;
        if (fired[j]) k0[j] += yElse;
      }
    }
    for (const [id, y] of targets) {
      const k = slot.get(id)!;
      if (k === ELSE) continue;
      for (const j of rulesByCause[k]) {
        if (!parentsFired(j)) continue;
        nC[j] += y;
        supportC[j]++;
        if (fired[j]) kC[j] += y;
      }
    }
    for (const j of set) fired[j] = 0;
  }
  await progress(FIT_END, true);

  // Priors: Dirichlet(strength x expert shares), fitted with the truncation EM.
  const alpha = expertShare.map((s) => strength * s);
  const fit = fitTruncatedDirichlet(alpha, [...groups.values()]);
  const priors: PriorProposal[] = classes.map((cause, k) => {
    const posterior = dirichletMarginal(fit.posterior, k);
    const [lo, hi] = betaCredibleInterval(posterior, intervalMass);
    const old = oldPriors[k];
    const proposed = roundSignificant(clamp(fit.mean[k] * priorScale, PRIOR_BOUNDS.min, PRIOR_BOUNDS.max));
    return {
      cause,
      old,
      proposed,
      changed: proposed !== old,
      evidence: {
        outcomes: outcomesByClass[k],
        weight: fit.observed[k],
        imputed: fit.imputed[k],
        posterior,
        interval: [lo * priorScale, hi * priorScale],
        oldOutsideInterval: old < lo * priorScale || old > hi * priorScale,
      },
    };
  });

  // Likelihood ratios.
  const rules: RuleProposal[] = lrRules.map((r, j) => {
    const params = r.event.params as { cause: string; lr: number };
    const est = estimateLikelihoodRatio({
      expertLr: params.lr,
      causeStrength: strength * expertShare[ruleCause[j]],
      referenceStrength: strength * expertShare[ELSE],
      causeOutcomes: nC[j],
      causeFired: kC[j],
      referenceOutcomes: n0[j],
      referenceFired: k0[j],
      pooledOutcomes: nAll[j],
      pooledFired: kAll[j],
    });
    const interval = ratioInterval(est.ifCause, est.ifReference, { mass: intervalMass, draws, seed: `${seed}:${r.name}` });
    let proposed = est.kept ? params.lr : roundSignificant(clamp(est.lr, LR_BOUNDS.min, LR_BOUNDS.max));
    const flat = proposed === 1;
    if (flat) proposed = est.lr > 1 || (est.lr === 1 && params.lr > 1) ? 1.01 : 0.99;
    return {
      rule: r.name,
      file: r.file,
      cause: params.cause,
      old: params.lr,
      proposed,
      changed: proposed !== params.lr,
      evidence: {
        outcomes: supportC[j] + support0[j],
        causeOutcomes: nC[j],
        causeFired: kC[j],
        referenceOutcomes: n0[j],
        referenceFired: k0[j],
        pooledOutcomes: nAll[j],
        pooledFired: kAll[j],
        parents: parentsByName.get(r.name) ?? [],
        interval,
        oldOutsideInterval: !est.kept && (params.lr < interval[0] || params.lr > interval[1]),
        pFiresIfCause: betaMean(est.ifCause),
        pFiresIfReference: betaMean(est.ifReference),
        capped: est.capped,
        kept: est.kept,
        flat,
      },
    };
  });

  // The new ruleset: same files and conditions, new numbers and version.
  const source = toRulesetSource(ruleset) as RulesetSource & { catalog: Record<string, any>; ruleFiles: Record<string, { rules: any[] }> };
  delete (source as { version?: string }).version;
  source.catalog.version = options.version;
  catalog.causes.forEach((_, k) => (source.catalog.causes[k].prior = priors[k].proposed));
  source.catalog.somethingElse.prior = priors[ELSE].proposed;
  const byName = new Map(rules.map((r) => [r.rule, r.proposed]));
  for (const r of ruleset.rules) {
    if (r.event.type !== 'likelihood') continue;
    source.ruleFiles[r.file].rules[r.index].event.params.lr = byName.get(r.name)!;
  }
  const next = validateRuleset(source);
  await progress(ESTIMATE_END, true);

  // Back-test on the held-out outcomes.
  const before = new AccuracyAccumulator();
  const after = new AccuracyAccumulator();
  let scored = 0;
  let skipped = 0;
  const oldScorer = options.rank ? undefined : createFiredRulesScorer(ruleset);
  const newScorer = options.rank ? undefined : createFiredRulesScorer(next);
  for (let i = 0; i < heldOut.length; i++) {
    const { outcome, targets } = heldOut[i];
    if (options.rank) {
      before.add(await options.rank(ruleset, outcome), targets);
      after.add(await options.rank(next, outcome), targets);
      scored++;
    } else {
      const names = await firedRulesOf(ruleset, outcome);
      if (!names) skipped++;
      else {
        before.add(oldScorer!.score(outcome, names), targets);
        after.add(newScorer!.score(outcome, names), targets);
        scored++;
      }
    }
    await progress(ESTIMATE_END + ((1 - ESTIMATE_END) * (i + 1)) / heldOut.length);
  }
  await progress(1, true);

  return {
    fromVersion: ruleset.version,
    version: next.version,
    ruleset: next,
    source: { catalog: source.catalog, ruleFiles: source.ruleFiles },
    priors,
    rules,
    changedPriors: priors.filter((p) => p.changed).length,
    changedRules: rules.filter((r) => r.changed).length,
    fit: { read, outcomes: fitted, withFiredRules: withFired, skipped: { noKnownCause, notStillFixed } },
    backTest: { heldOut: heldOut.length, scored, skipped, before: before.result(), after: after.result() },
    settings: { strength, seed, holdOutFraction, intervalMass, draws },
  };
}
