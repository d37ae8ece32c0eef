/**
 * The plain TypeScript evaluator: the same rules, facts, operators and response assembly as the
 * json-rules-engine path, with the conditions evaluated synchronously in a loop. It exists to
 * check the engine path (both must fire the same rules) and to measure its overhead in the bench.
 */
import type { RankRequest, RankResponse } from '@fuelwright/shared';
import { assembleResponse, candidateRules, compileRuleset, prepare, type CompiledRuleset, type RankOptions } from './core.js';
import type { Condition, Ruleset } from './model.js';
import { OPERATORS } from './operators.js';
import { ensureValidated } from './validate.js';

/** Evaluates one condition tree against fact values, with json-rules-engine's meaning. */
export function evaluateCondition(condition: Condition, facts: ReadonlyMap<string, unknown>): boolean {
  if ('all' in condition) {
    for (const c of condition.all) if (!evaluateCondition(c, facts)) return false;
    return true;
  }
  if ('any' in condition) {
    for (const c of condition.any) if (evaluateCondition(c, facts)) return true;
    return false;
  }
  if ('not' in condition) return !evaluateCondition(condition.not, facts);
  return OPERATORS[condition.operator](facts.get(condition.fact), condition.value);
}

export interface PlainEvaluatorOptions {
  /** Evaluate only the rules whose index bucket is active (default true, as the engine does). */
  indexed?: boolean;
}

export interface PlainEvaluator {
  readonly version: string;
  rank(request: RankRequest, options?: RankOptions): RankResponse;
  /** Names of the rules that fire for a request, in ruleset order. */
  firedRules(request: RankRequest, options?: RankOptions): string[];
}

function firedPositions(compiled: CompiledRuleset, request: unknown, options: RankOptions | undefined, indexed: boolean) {
  const prepared = prepare(compiled, request, options);
  const fired: number[] = [];
  for (const pos of candidateRules(compiled, prepared, indexed)) {
    if (evaluateCondition(compiled.rules[pos].def.conditions, prepared.facts)) fired.push(pos);
  }
  return { prepared, fired };
}

export function createPlainEvaluator(ruleset: Ruleset, options: PlainEvaluatorOptions = {}): PlainEvaluator {
  const compiled = compileRuleset(ensureValidated(ruleset));
  const indexed = options.indexed ?? true;
  return {
    version: compiled.ruleset.version,
    rank(request, rankOptions) {
      const { prepared, fired } = firedPositions(compiled, request, rankOptions, indexed);
      return assembleResponse(compiled, prepared.request, fired);
    },
    firedRules(request, rankOptions) {
      const { fired } = firedPositions(compiled, request, rankOptions, indexed);
      return fired.sort((a, b) => a - b).map((p) => compiled.rules[p].def.name);
    },
  };
}
