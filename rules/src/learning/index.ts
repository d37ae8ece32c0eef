/**
 * Learning from outcomes (pure, no I/O): outcome records, insight metrics as streaming
 * accumulators, and the Bayesian refinement of priors and likelihood ratios with a back-test.
 *
 *   const acc = new InsightsAccumulator(ruleset);          // per ruleset version
 *   for await (const o of rows) acc.add(o);                // stream; bounded memory
 *   acc.result();                                          // GET /api/insights
 *
 *   const p = await proposeRuleset(ruleset, rows, { version: '1.1.0', strength: 200, seed: 7,
 *     holdOutFraction: 0.2, onProgress: (f) => report(f) });
 *   p.priors, p.rules                                      // the diff: old, proposed, evidence
 *   p.backTest.before, p.backTest.after                    // top-1, top-3, Brier on held-out outcomes
 *   p.ruleset, p.source                                    // the new version, to publish
 *
 * See README.md in this folder for the maths.
 */
export {
  SOMETHING_ELSE_ID,
  confirmedWeights,
  sortRanking,
  outcomeToRankRequest,
  rankingFromResponse,
  openingRankFromResponse,
  type OutcomeRecord,
  type OpeningRank,
  type RankingEntry,
} from './outcome.js';
export {
  topKHit,
  brierScore,
  calibrationBinIndex,
  computeInsights,
  AccuracyAccumulator,
  CalibrationAccumulator,
  SymptomCauseAccumulator,
  LabourAccumulator,
  WrongWayRulesAccumulator,
  InsightsAccumulator,
  type RankingAccuracy,
  type Calibration,
  type CalibrationBin,
  type SymptomCausePair,
  type LabourByCause,
  type WrongWayRule,
  type WrongWayRules,
  type Insights,
  type InsightsOptions,
  type InsightsState,
  type AccuracyState,
  type CalibrationState,
  type SymptomCauseState,
  type LabourState,
  type WrongWayState,
} from './metrics.js';
export {
  proposeRuleset,
  roundSignificant,
  LR_BOUNDS,
  PRIOR_BOUNDS,
  SIGNIFICANT_DIGITS,
  type ProposeOptions,
  type RulesetProposal,
  type PriorProposal,
  type RuleProposal,
  type BackTest,
} from './refine.js';
export {
  createFiredRulesScorer,
  createFiredRulesRanker,
  createEngineRanker,
  storedFiredRules,
  type FiredRulesScorer,
  type ScoringInput,
  type Ranker,
  type FiredRulesSource,
  type RankingEngine,
} from './scoring.js';
export {
  betaPosterior,
  betaMean,
  betaVariance,
  betaCredibleInterval,
  dirichletPosterior,
  dirichletMean,
  dirichletMarginal,
  fitTruncatedDirichlet,
  estimateLikelihoodRatio,
  ratioInterval,
  ratioIntervalDelta,
  Z_90,
  MAX_PRIOR_FIRING,
  type BetaParams,
  type TruncatedCounts,
  type TruncatedDirichletFit,
  type LikelihoodRatioInput,
  type LikelihoodRatioEstimate,
} from './bayes.js';
export { lnGamma, lnBeta, regularizedIncompleteBeta, betaCdf, betaQuantile, betaInterval } from './beta.js';
export { hash32, hashUnit, seedOf, isHeldOut, createRandom, normal as normalDeviate, gamma as gammaDeviate, beta as betaDeviate, pickWeighted, sortedQuantile, type Random } from './random.js';
export { conditionImplies, ruleImplies, ruleParents } from './implication.js';
