/**
 * The diagnosis engine: json-rules-engine evaluates the rules, the shared core turns the fired
 * rules into ranked causes, a check plan and any stop finding.
 *
 * Built once per ruleset version and reused for every request. How json-rules-engine is used,
 * for speed:
 * - facts are computed once per request by pure functions and handed over as constant facts
 *   without cache keys (no hashing, no `path` lookups);
 * - rules are split by an index bucket (the first symptom, check result, or setup or conditions
 *   fact their top-level `all` cannot do without), one engine per bucket, and a request runs
 *   only the buckets of the symptoms and check results it reports and the facts it knows, plus
 *   the bucket of rules that need none of these; a rule outside those buckets cannot fire, so
 *   the result is the same as running every rule (the tests check this against the plain
 *   evaluator with the index switched off);
 * - rules with identical conditions (a symptom's general rules for several causes, say) become
 *   one engine rule whose event lists them all, so their conditions are evaluated once;
 * - the engines share one almanac per request, hold a compact copy of each rule (the event is
 *   just the positions of the rules behind it) and have no event listeners;
 * - requests run one after another through a queue, because a json-rules-engine Engine keeps its
 *   run status on the instance and concurrent runs on one instance can cut each other short.
 */
import { Almanac, Engine, Fact } from 'json-rules-engine';
import type { CatalogResponse, RankRequest, RankResponse } from '@fuelwright/shared';
import {
  ALWAYS_BUCKET,
  assembleResponse,
  compileRuleset,
  prepare,
  validateWith,
  type CompiledRuleset,
  type PreparedRequest,
  type RankOptions,
} from './core.js';
import type { Ruleset } from './model.js';
import { CUSTOM_OPERATORS } from './operators.js';
import type { RankRequestValidation } from './request.js';
import { ensureValidated } from './validate.js';

export interface DiagnosisEngineOptions {
  /** Split the rules into index buckets (default true). False runs every rule on every request. */
  indexed?: boolean;
  /** Evaluate identical conditions once for all the rules that share them (default true). */
  shareConditions?: boolean;
}

export interface DiagnosisEngine {
  readonly version: string;
  readonly ruleset: Ruleset;
  /** The body of GET /api/catalog for this ruleset. */
  readonly catalog: CatalogResponse;
  /** Shape and ids of a rank request; `ok: false` carries unknown ids per field for a 400. */
  validateRankRequest(input: unknown): RankRequestValidation;
  /** Ranks causes and plans checks. Throws `RankRequestError` for a request that does not validate. */
  rank(request: RankRequest, options?: RankOptions): Promise<RankResponse>;
  /** Names of the rules that fire for a request, in ruleset order. */
  firedRules(request: RankRequest, options?: RankOptions): Promise<string[]>;
}

function makeEngine(compiled: CompiledRuleset, positions: readonly number[], share: boolean): Engine {
  const engine = new Engine([], { allowUndefinedFacts: true });
  for (const [name, fn] of Object.entries(CUSTOM_OPERATORS)) engine.addOperator(name, fn);
  // Rules with the same conditions are true together: evaluate their conditions once, as one
  // engine rule whose event names every rule behind it.
  const byConditions = new Map<string, number[]>();
  for (const pos of positions) {
    const key = share ? JSON.stringify(compiled.rules[pos].def.conditions) : `${pos}\u0000${JSON.stringify(compiled.rules[pos].def.conditions)}`;
    const list = byConditions.get(key);
    if (list) list.push(pos);
    else byConditions.set(key, [pos]);
  }
  for (const [key, group] of byConditions) {
    engine.addRule({
      name: group.join(','),
      // json-rules-engine keeps (and may annotate) the condition objects: give it its own copy.
      conditions: structuredClone(compiled.rules[group[0]].def.conditions) as never,
      event: { type: group.join(',') },
    });
  }
  return engine;
}

export function buildDiagnosisEngine(ruleset: Ruleset, options: DiagnosisEngineOptions = {}): DiagnosisEngine {
  const compiled = compileRuleset(ensureValidated(ruleset));
  const indexed = options.indexed ?? true;
  const share = options.shareConditions ?? true;
  const engines = new Map<string, Engine>();
  if (indexed) {
    for (const [bucket, positions] of compiled.buckets) engines.set(bucket, makeEngine(compiled, positions, share));
  } else {
    engines.set(ALWAYS_BUCKET, makeEngine(compiled, compiled.rules.map((r) => r.position), share));
  }

  async function evaluate(prepared: PreparedRequest): Promise<number[]> {
    const almanac = new Almanac({ allowUndefinedFacts: true });
    for (const [id, value] of prepared.facts) almanac.addFact(new Fact(id, value as never, { cache: false }));
    const buckets = indexed ? prepared.buckets : [ALWAYS_BUCKET];
    let events: { type: string }[] = [];
    for (const bucket of buckets) {
      const engine = engines.get(bucket);
      if (!engine) continue;
      // All engines of a request share the almanac, so the last run's events hold every success.
      events = (await engine.run({}, { almanac })).events;
    }
    const fired: number[] = [];
    for (const e of events) for (const pos of e.type.split(',')) fired.push(Number(pos));
    return fired;
  }

  let queue: Promise<unknown> = Promise.resolve();
  function serially<T>(task: () => Promise<T>): Promise<T> {
    const run = queue.then(task, task);
    queue = run.catch(() => undefined);
    return run;
  }

  return {
    version: compiled.ruleset.version,
    ruleset: compiled.ruleset,
    catalog: compiled.catalogResponse,
    validateRankRequest: (input) => validateWith(compiled, input),
    rank(request, rankOptions) {
      return serially(async () => {
        const prepared = prepare(compiled, request, rankOptions);
        return assembleResponse(compiled, prepared.request, await evaluate(prepared));
      });
    },
    firedRules(request, rankOptions) {
      return serially(async () => {
        const prepared = prepare(compiled, request, rankOptions);
        return (await evaluate(prepared)).sort((a, b) => a - b).map((p) => compiled.rules[p].def.name);
      });
    },
  };
}
