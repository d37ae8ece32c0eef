/**
 * @fuelwright/rules: the diagnostic knowledge base and the ranking and check-planning engine.
 * Pure TypeScript, no I/O.
 *
 *   const engine = buildDiagnosisEngine(loadRuleset());   // once, at start-up
 *   engine.catalog                                        // GET /api/catalog
 *   const v = engine.validateRankRequest(body);           // 400 when !v.ok (v.unknown, v.fields)
 *   const res = await engine.rank(body);                  // POST /api/diagnosis/rank
 */
export { buildDiagnosisEngine, type DiagnosisEngine, type DiagnosisEngineOptions } from './engine.js';
export { createPlainEvaluator, evaluateCondition, type PlainEvaluator, type PlainEvaluatorOptions } from './plain.js';
export { loadRuleset, SHIPPED_RULESET_VERSION, SHIPPED_RULESET_SOURCES } from './ruleset.js';
export {
  validateRuleset,
  validateCatalog,
  toRulesetSource,
  formatIssue,
  RulesetValidationError,
  CATALOG_FILE,
  type RulesetIssue,
} from './validate.js';
export {
  validateRankRequest,
  rankRequestSchema,
  RankRequestError,
  MAX_SYMPTOMS,
  MAX_RESULTS,
  type RankRequestValidation,
} from './request.js';
export { MIN_FIND_PROBABILITY, type RankOptions } from './core.js';
export { FACTS, computeFacts, daysSince, densityChangeOf, densityOf, type FactDefinition, type NormalisedRankRequest } from './facts.js';
export { OPERATORS, shows, resultIs } from './operators.js';
export {
  logSumExp,
  priorLogOdds,
  probabilitiesFromLogOdds,
  checkResultLikelihoods,
  checkResultLr,
  bayesUpdate,
} from './belief.js';
export { bottomUpPOverC, pOverCOrder, expectedCost, type PlanAction, type OpeningCost } from './planner.js';
export * as trade from './trade.js';
export {
  HAZARDS,
  HAZARD_CAUTIONS,
  type Catalog,
  type CatalogCause,
  type CatalogCheck,
  type CatalogSymptom,
  type CatalogFix,
  type CatalogCaution,
  type CatalogGroup,
  type Condition,
  type RuleDefinition,
  type RuleEvent,
  type Ruleset,
  type RulesetSource,
  type Hazard,
} from './model.js';
export * from './learning/index.js';
