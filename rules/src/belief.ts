/**
 * Belief maths. One fault is assumed (the causes and "something else" are mutually exclusive).
 * Each cause carries its log-odds against "something else": ln(prior / prior of something else)
 * plus ln(LR) of each piece of evidence. Probabilities come from normalising the odds over the
 * causes plus "something else" (whose log-odds against itself is 0).
 *
 * A check result updates the belief by Bayes' rule with the check's sensitivity (per tested
 * cause) and specificity (per check):
 *   P(fault found | tested cause c) = sensitivity(c)     P(looks fine | tested cause c) = 1 - sensitivity(c)
 *   P(fault found | any other)      = 1 - specificity    P(looks fine | any other)      = specificity
 * Causes the check does not test share the likelihood of "something else", so their odds do not
 * move; a tested cause's log-odds move by ln(sensitivity / (1 - specificity)) on "fault found" and
 * by ln((1 - sensitivity) / specificity) on "looks fine". "Could not check" changes nothing.
 */
import type { CheckResultValue } from '@fuelwright/shared';

/** ln(sum(exp(x))) without overflow. */
export function logSumExp(values: readonly number[]): number {
  let max = -Infinity;
  for (const v of values) if (v > max) max = v;
  if (max === -Infinity) return -Infinity;
  let sum = 0;
  for (const v of values) sum += Math.exp(v - max);
  return max + Math.log(sum);
}

/** Log-odds of a cause against "something else" from the two priors. */
export function priorLogOdds(prior: number, somethingElsePrior: number): number {
  return Math.log(prior / somethingElsePrior);
}

/**
 * Probabilities from log-odds against "something else": p_i = e^{x_i} / (1 + sum_j e^{x_j}),
 * and "something else" gets 1 / (1 + sum_j e^{x_j}).
 */
export function probabilitiesFromLogOdds(logOdds: readonly number[]): { probabilities: number[]; somethingElse: number } {
  const z = logSumExp([0, ...logOdds]);
  return { probabilities: logOdds.map((x) => Math.exp(x - z)), somethingElse: Math.exp(-z) };
}

/** The likelihood of a check result under a tested cause and under any other hypothesis. */
export function checkResultLikelihoods(sensitivity: number, specificity: number, result: CheckResultValue): { ifTested: number; ifOther: number } {
  switch (result) {
    case 'fault-found':
      return { ifTested: sensitivity, ifOther: 1 - specificity };
    case 'looks-fine':
      return { ifTested: 1 - sensitivity, ifOther: specificity };
    case 'not-checked':
      return { ifTested: 1, ifOther: 1 };
  }
}

/** Likelihood ratio of a check result for a tested cause (against "something else"). */
export function checkResultLr(sensitivity: number, specificity: number, result: CheckResultValue): number {
  const { ifTested, ifOther } = checkResultLikelihoods(sensitivity, specificity, result);
  return ifTested / ifOther;
}

/**
 * Bayes' rule on an explicit distribution (cause id -> probability, including "something else"):
 * P(h | r) = P(h) P(r | h) / sum_h' P(h') P(r | h'). `tested` maps the causes the check tests to
 * their sensitivity. Used to cross-check the log-odds path.
 */
export function bayesUpdate(
  distribution: Readonly<Record<string, number>>,
  tested: Readonly<Record<string, number>>,
  specificity: number,
  result: CheckResultValue,
): Record<string, number> {
  const joint: Record<string, number> = {};
  let total = 0;
  for (const [h, p] of Object.entries(distribution)) {
    const sens = tested[h];
    const l = sens === undefined ? checkResultLikelihoods(0.5, specificity, result).ifOther : checkResultLikelihoods(sens, specificity, result).ifTested;
    joint[h] = p * l;
    total += joint[h];
  }
  for (const h of Object.keys(joint)) joint[h] /= total;
  return joint;
}
