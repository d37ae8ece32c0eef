/**
 * Conjugate updates used by the refinement (derivations in README.md in this folder):
 * - Beta(alpha, beta) prior on a probability, s successes in n trials -> Beta(alpha + s, beta + n - s).
 * - Dirichlet(alpha) prior on category probabilities, counts n -> Dirichlet(alpha + n); each
 *   marginal is Beta(alpha_i + n_i, sum(alpha) + N - alpha_i - n_i).
 * - Cause priors when some causes cannot occur on some karts: the Dirichlet fitted by EM for
 *   truncated multinomial sampling (`fitTruncatedDirichlet`).
 * - A rule's likelihood ratio from Beta posteriors on P(fires | its cause) and
 *   P(fires | something else) (`estimateLikelihoodRatio`).
 */
import { betaInterval } from './beta.js';
import { beta as betaDeviate, createRandom, sortedQuantile } from './random.js';

export interface BetaParams {
  alpha: number;
  beta: number;
}

/** Beta prior updated with `successes` out of `trials` (fractional counts allowed). */
export function betaPosterior(prior: BetaParams, successes: number, trials: number): BetaParams {
  if (!(successes >= 0) || !(trials >= successes)) throw new RangeError(`need 0 <= successes <= trials (got ${successes} of ${trials})`);
  return { alpha: prior.alpha + successes, beta: prior.beta + trials - successes };
}

export function betaMean(p: BetaParams): number {
  return p.alpha / (p.alpha + p.beta);
}

export function betaVariance(p: BetaParams): number {
  const s = p.alpha + p.beta;
  return (p.alpha * p.beta) / (s * s * (s + 1));
}

/** Equal-tailed credible interval of a Beta distribution. */
export function betaCredibleInterval(p: BetaParams, mass = 0.9): [number, number] {
  return betaInterval(p.alpha, p.beta, mass);
}

/** Dirichlet prior updated with category counts. */
export function dirichletPosterior(alpha: readonly number[], counts: readonly number[]): number[] {
  if (alpha.length !== counts.length) throw new RangeError('alpha and counts differ in length');
  return alpha.map((a, i) => {
    if (!(counts[i] >= 0)) throw new RangeError(`counts must be >= 0 (got ${counts[i]})`);
    return a + counts[i];
  });
}

/** Posterior mean of each category. */
export function dirichletMean(alpha: readonly number[]): number[] {
  const total = alpha.reduce((s, a) => s + a, 0);
  return alpha.map((a) => a / total);
}

/** The marginal Beta of category i of a Dirichlet. */
export function dirichletMarginal(alpha: readonly number[], i: number): BetaParams {
  const total = alpha.reduce((s, a) => s + a, 0);
  return { alpha: alpha[i], beta: total - alpha[i] };
}

/** Outcomes of karts that share one set of possible categories. */
export interface TruncatedCounts {
  /** Which categories can occur for these outcomes. */
  possible: readonly boolean[];
  /** Confirmations per category (only possible categories may be non-zero). */
  counts: readonly number[];
}

export interface TruncatedDirichletFit {
  /** Posterior mean of each category's probability (over all categories, as on a kart where all can occur). */
  mean: number[];
  /** Dirichlet parameters: prior alpha + observed counts + the expected unobserved counts. */
  posterior: number[];
  /** Observed counts summed over the groups. */
  observed: number[];
  /** Expected counts imputed for categories that could not occur on some karts. */
  imputed: number[];
  iterations: number;
}

/**
 * Dirichlet(alpha) prior, observations from karts on which only some categories can occur.
 *
 * The ranking's model: on a kart where set E of categories can occur, category k has probability
 * theta_k / theta(E). Such an outcome is a draw from the full distribution conditioned on E; the
 * draws that would have fallen outside E are missing data. EM for truncated multinomial
 * sampling: given theta, a group of n outcomes restricted to E implies n (1 - theta(E)) / theta(E)
 * missing draws, shared among the impossible categories in proportion to theta; then theta is the
 * posterior mean of Dirichlet(alpha + observed + imputed). Repeated to a fixed point. When every
 * category can occur everywhere nothing is imputed and this is the plain conjugate update.
 */
export function fitTruncatedDirichlet(alpha: readonly number[], groups: readonly TruncatedCounts[], options: { tolerance?: number; maxIterations?: number } = {}): TruncatedDirichletFit {
  const k = alpha.length;
  const tol = options.tolerance ?? 1e-13;
  const maxIt = options.maxIterations ?? 1000;
  const observed = new Array<number>(k).fill(0);
  for (const g of groups) {
    if (g.counts.length !== k || g.possible.length !== k) throw new RangeError('group length differs from alpha');
    for (let i = 0; i < k; i++) observed[i] += g.counts[i];
  }
  const restricted = groups.filter((g) => g.possible.some((p) => !p) && g.counts.some((c) => c > 0));
  let theta = dirichletMean(dirichletPosterior(alpha, observed));
  let imputed = new Array<number>(k).fill(0);
  let iterations = 0;
  for (; iterations < maxIt && restricted.length; iterations++) {
    const next = new Array<number>(k).fill(0);
    for (const g of restricted) {
      let n = 0;
      let inside = 0;
      for (let i = 0; i < k; i++) {
        n += g.counts[i];
        if (g.possible[i]) inside += theta[i];
      }
      if (!(inside > 0)) continue;
      const missing = (n * (1 - inside)) / inside;
      const outside = 1 - inside;
      if (!(outside > 0)) continue;
      for (let i = 0; i < k; i++) if (!g.possible[i]) next[i] += (missing * theta[i]) / outside;
    }
    imputed = next;
    const nextTheta = dirichletMean(alpha.map((a, i) => a + observed[i] + imputed[i]));
    let change = 0;
    for (let i = 0; i < k; i++) change = Math.max(change, Math.abs(nextTheta[i] - theta[i]));
    theta = nextTheta;
    if (change < tol) {
      iterations++;
      break;
    }
  }
  const posterior = alpha.map((a, i) => a + observed[i] + imputed[i]);
  return { mean: dirichletMean(posterior), posterior, observed, imputed, iterations };
}

export interface LikelihoodRatioInput {
  /** The expert's ratio. */
  expertLr: number;
  /** Pseudo-outcomes the expert's view of P(fires | cause) weighs (> 0): strength x the cause's expert share. */
  causeStrength: number;
  /** Pseudo-outcomes the prior on P(fires | something else) weighs (> 0): strength x its expert share. */
  referenceStrength: number;
  /** Outcomes confirming the rule's cause (where its parents fired), and of those where it fired. */
  causeOutcomes: number;
  causeFired: number;
  /** Outcomes confirming "something else" (where its parents fired), and of those where it fired. */
  referenceOutcomes: number;
  referenceFired: number;
  /** All outcomes where the rule could fire (its parents fired), whatever their cause, and of those where it fired. */
  pooledOutcomes: number;
  pooledFired: number;
}

export interface LikelihoodRatioEstimate {
  /** Ratio of the posterior means, E[P(fires | cause)] / E[P(fires | something else)]; the expert's when no outcome of the cause was seen. */
  lr: number;
  /** Posterior of P(fires | cause). */
  ifCause: BetaParams;
  /** Posterior of P(fires | something else). */
  ifReference: BetaParams;
  /** Prior of P(fires | cause): mean expertLr x E[P(fires | something else)]. */
  causePrior: BetaParams;
  /** Prior of P(fires | something else): mean the pooled firing rate. */
  referencePrior: BetaParams;
  /** True when expertLr x the base rate reached the cap and the prior mean was held below 1. */
  capped: boolean;
  /** True when no outcome of the cause was seen, so the expert's ratio was kept. */
  kept: boolean;
}

/** Largest prior mean allowed for P(fires | cause). */
export const MAX_PRIOR_FIRING = 0.99;

/**
 * A rule's likelihood ratio from outcomes, with the expert's ratio as the prior (README.md):
 * - f = (pooledFired + 1/2) / (pooledOutcomes + 1): how often the rule fires at all;
 * - P(fires | something else) ~ Beta(s0 f, s0 (1 - f)) updated with k0 of n0; b = its mean;
 * - P(fires | cause) ~ Beta(sc m, sc (1 - m)) with m = expertLr x b (held at most 0.99), updated
 *   with kc of nc; so with no outcome of the cause the ratio of means is exactly the expert's;
 * - LR = E[P(fires | cause)] / b. With nc = 0 the data say nothing about P(fires | cause) and the
 *   expert's ratio is kept as it is.
 */
export function estimateLikelihoodRatio(input: LikelihoodRatioInput): LikelihoodRatioEstimate {
  const { expertLr, causeStrength, referenceStrength, causeOutcomes, causeFired, referenceOutcomes, referenceFired, pooledOutcomes, pooledFired } = input;
  if (!(expertLr > 0)) throw new RangeError(`expert LR must be > 0 (got ${expertLr})`);
  if (!(causeStrength > 0) || !(referenceStrength > 0)) throw new RangeError(`strengths must be > 0 (got ${causeStrength}, ${referenceStrength})`);
  if (!(pooledOutcomes >= pooledFired) || !(pooledFired >= 0)) throw new RangeError(`need 0 <= pooledFired <= pooledOutcomes (got ${pooledFired} of ${pooledOutcomes})`);
  const f = (pooledFired + 0.5) / (pooledOutcomes + 1);
  const referencePrior = { alpha: referenceStrength * f, beta: referenceStrength * (1 - f) };
  const ifReference = betaPosterior(referencePrior, referenceFired, referenceOutcomes);
  const base = betaMean(ifReference);
  let m = expertLr * base;
  const capped = m > MAX_PRIOR_FIRING;
  if (capped) m = MAX_PRIOR_FIRING;
  const causePrior = { alpha: causeStrength * m, beta: causeStrength * (1 - m) };
  const ifCause = betaPosterior(causePrior, causeFired, causeOutcomes);
  const kept = !(causeOutcomes > 0);
  return { lr: kept ? expertLr : betaMean(ifCause) / base, ifCause, ifReference, causePrior, referencePrior, capped, kept };
}

/**
 * Credible interval of the ratio of two independent Beta variables, by Monte Carlo: `draws`
 * pairs from a seeded generator, the equal-tailed quantiles of their ratios.
 */
export function ratioInterval(numerator: BetaParams, denominator: BetaParams, options: { mass?: number; draws?: number; seed: number | string }): [number, number] {
  const mass = options.mass ?? 0.9;
  const draws = options.draws ?? 2000;
  const random = createRandom(options.seed);
  const ratios = new Float64Array(draws);
  for (let i = 0; i < draws; i++) ratios[i] = betaDeviate(random, numerator.alpha, numerator.beta) / betaDeviate(random, denominator.alpha, denominator.beta);
  ratios.sort();
  const tail = (1 - mass) / 2;
  return [sortedQuantile(ratios, tail), sortedQuantile(ratios, 1 - tail)];
}

/** Standard normal 95 % quantile, for a 90 % equal-tailed interval. */
export const Z_90 = 1.6448536269514722;

/**
 * Delta-method interval of the ratio of two independent Beta variables: the log ratio taken as
 * normal with variance Var(X)/E[X]^2 + Var(Y)/E[Y]^2 around ln(E[X]/E[Y]); `z` is the standard
 * normal quantile of the upper tail (Z_90 for a 90 % interval). A cross-check of `ratioInterval`.
 */
export function ratioIntervalDelta(numerator: BetaParams, denominator: BetaParams, z = Z_90): [number, number] {
  const mn = betaMean(numerator);
  const md = betaMean(denominator);
  const sd = Math.sqrt(betaVariance(numerator) / (mn * mn) + betaVariance(denominator) / (md * md));
  const centre = Math.log(mn / md);
  return [Math.exp(centre - z * sd), Math.exp(centre + z * sd)];
}
