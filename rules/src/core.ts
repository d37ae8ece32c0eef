/**
 * What the json-rules-engine path and the plain evaluator share: the ruleset compiled once
 * (lookups, the rule index, the catalog response), request preparation (validation, facts), and
 * turning the fired rules into the rank response (belief, Bayes updates, plan, stop).
 */
import {
  ENGINE_TEMPS,
  ENGINE_TEMP_LABELS,
  THROTTLE_BANDS,
  THROTTLE_BAND_INFO,
  TRACK_POSITIONS,
  TRACK_POSITION_LABELS,
  type CatalogResponse,
  type CautionDto,
  type CheckDto,
  type PlanStep,
  type RankResponse,
  type RankedCause,
  type ReasonDto,
  type StopFinding,
} from '@fuelwright/shared';
import { checkResultLr, priorLogOdds, probabilitiesFromLogOdds } from './belief.js';
import { computeFacts, type NormalisedRankRequest } from './facts.js';
import type { Catalog, CatalogCause, CatalogCheck, CatalogSymptom, Condition, RuleDefinition, Ruleset } from './model.js';
import { bottomUpPOverC, expectedCost, type PlanAction } from './planner.js';
import { RankRequestError, validateRankRequest, type RankRequestValidation } from './request.js';
import { deepFreeze } from './validate.js';

/** Checks whose chance of finding the fault is below this are left off the plan. */
export const MIN_FIND_PROBABILITY = 0.005;

/** Rules that need no reported symptom, check result or known fact sit in this bucket, which always runs. */
export const ALWAYS_BUCKET = '*';

export interface CompiledRule {
  def: RuleDefinition;
  /** Position in `ruleset.rules`. */
  position: number;
  /** Index bucket: `symptom:<id>`, `check:<id>`, `fact:<id>` (the fact must be known) or `*`. */
  bucket: string;
  /** Symptoms the rule requires (its top-level `all` holds `shows` or `showsOnly` on them). */
  requiresSymptoms: string[];
}

export interface CompiledRuleset {
  ruleset: Ruleset;
  catalog: Catalog;
  rules: CompiledRule[];
  /** Rule positions per bucket. */
  buckets: Map<string, number[]>;
  symptomById: Map<string, CatalogSymptom>;
  causeById: Map<string, CatalogCause>;
  checkById: Map<string, CatalogCheck>;
  cautionById: Map<string, CautionDto>;
  groupOpening: Map<string, number>;
  lookups: { symptoms: Set<string>; checks: Set<string> };
  /** Checks whose "fault found" fires a stop rule. */
  stopChecks: Set<string>;
  /** Cautions of each check and symptom, resolved once. */
  checkCautions: Map<string, CautionDto[]>;
  symptomCautions: Map<string, CautionDto[]>;
  /** Reason text for a reported symptom a cause does not usually give. */
  unexplainedText: Map<string, string>;
  catalogResponse: CatalogResponse;
}

function topLevelLeaves(c: Condition): Condition[] {
  if ('all' in c) return c.all;
  return [];
}

/** Operators that are false whenever the fact is unknown (json-rules-engine semantics). */
const FALSE_WHEN_UNKNOWN = new Set(['equal', 'in', 'lessThan', 'lessThanInclusive', 'greaterThan', 'greaterThanInclusive']);

/**
 * The rule's index bucket: the first thing its top-level `all` cannot do without. A reported
 * symptom first, then a check result, then a setup or conditions fact that must be known; rules
 * with none of these always run.
 */
function compileRule(def: RuleDefinition, position: number): CompiledRule {
  const leaves = topLevelLeaves(def.conditions);
  const requiresSymptoms: string[] = [];
  let symptomBucket: string | undefined;
  let checkBucket: string | undefined;
  let factBucket: string | undefined;
  for (const leaf of leaves) {
    if (!('fact' in leaf)) continue;
    if (leaf.fact === 'symptoms' && (leaf.operator === 'shows' || leaf.operator === 'showsOnly')) {
      const symptom = (leaf.value as { symptom: string }).symptom;
      requiresSymptoms.push(symptom);
      symptomBucket ??= `symptom:${symptom}`;
    } else if (leaf.fact === 'checkResults' && leaf.operator === 'resultIs') {
      checkBucket ??= `check:${(leaf.value as { check: string }).check}`;
    } else if (FALSE_WHEN_UNKNOWN.has(leaf.operator)) {
      factBucket ??= `fact:${leaf.fact}`;
    }
  }
  return { def, position, bucket: symptomBucket ?? checkBucket ?? factBucket ?? ALWAYS_BUCKET, requiresSymptoms };
}

/** Compiles a validated ruleset once; both evaluators build on this. */
export function compileRuleset(ruleset: Ruleset): CompiledRuleset {
  const catalog = ruleset.catalog;
  const rules = ruleset.rules.map((r, i) => compileRule(r, i));
  const buckets = new Map<string, number[]>();
  for (const r of rules) {
    const list = buckets.get(r.bucket);
    if (list) list.push(r.position);
    else buckets.set(r.bucket, [r.position]);
  }
  const cautionById = new Map<string, CautionDto>(catalog.cautions.map((c) => [c.id, { id: c.id, severity: c.severity, title: c.title, text: c.text }]));
  const stopChecks = new Set<string>();
  for (const r of ruleset.rules) if (r.event.type === 'stop') stopChecks.add(r.event.params.check);
  const compiled: Omit<CompiledRuleset, 'catalogResponse'> = {
    ruleset,
    catalog,
    rules,
    buckets,
    symptomById: new Map(catalog.symptoms.map((s) => [s.id, s])),
    causeById: new Map(catalog.causes.map((c) => [c.id, c])),
    checkById: new Map(catalog.checks.map((c) => [c.id, c])),
    cautionById,
    groupOpening: new Map(catalog.groups.map((g) => [g.id, g.openingMinutes])),
    lookups: { symptoms: new Set(catalog.symptoms.map((s) => s.id)), checks: new Set(catalog.checks.map((c) => c.id)) },
    stopChecks,
    checkCautions: new Map(catalog.checks.map((c) => [c.id, cautionsOf({ cautionById }, c.cautions)])),
    symptomCautions: new Map(catalog.symptoms.map((s) => [s.id, cautionsOf({ cautionById }, s.cautions)])),
    unexplainedText: new Map(catalog.symptoms.map((s) => [s.id, `Does not usually give: ${s.label.toLowerCase()}`])),
  };
  // Caution lists and the catalog response are shared by every response: freeze them.
  return deepFreeze({ ...compiled, catalogResponse: buildCatalogResponse(compiled) });
}

function cautionsOf(compiled: Pick<CompiledRuleset, 'cautionById'>, ids: readonly string[]): CautionDto[] {
  // "stop" cautions first, then in the order the catalog lists them.
  const list = ids.map((id) => compiled.cautionById.get(id)!);
  return [...list.filter((c) => c.severity === 'stop'), ...list.filter((c) => c.severity !== 'stop')];
}

function buildCatalogResponse(compiled: Omit<CompiledRuleset, 'catalogResponse'>): CatalogResponse {
  const { catalog } = compiled;
  const checks: CheckDto[] = catalog.checks.map((c) => ({
    id: c.id,
    label: c.label,
    group: c.group,
    minutes: c.minutes,
    cautions: cautionsOf(compiled, c.cautions),
    steps: [...c.steps],
    tools: [...c.tools],
    record: [...c.record],
    faultFoundMeans: c.faultFoundMeans,
    looksFineMeans: c.looksFineMeans,
    tests: c.tests.map((t) => ({ cause: t.cause, sensitivity: t.sensitivity })),
    specificity: c.specificity,
    ...(c.carburettorKinds ? { carburettorKinds: [...c.carburettorKinds] } : {}),
    stopOnFault: compiled.stopChecks.has(c.id),
  }));
  return {
    version: compiled.ruleset.version,
    throttleBands: THROTTLE_BANDS.map((id) => ({ id, label: THROTTLE_BAND_INFO[id].label, circuit: THROTTLE_BAND_INFO[id].circuit })),
    engineTemps: ENGINE_TEMPS.map((id) => ({ id, label: ENGINE_TEMP_LABELS[id] })),
    trackPositions: TRACK_POSITIONS.map((id) => ({ id, label: TRACK_POSITION_LABELS[id] })),
    groups: catalog.groups.map((g) => ({ id: g.id, label: g.label, openingMinutes: g.openingMinutes, steps: [...g.steps], cautions: cautionsOf(compiled, g.cautions) })),
    symptoms: catalog.symptoms.map((s) => ({ id: s.id, label: s.label, description: s.description, dimensions: [...s.dimensions], cautions: cautionsOf(compiled, s.cautions) })),
    causes: catalog.causes.map((c) => ({
      id: c.id,
      label: c.label,
      description: c.description,
      prior: c.prior,
      ...(c.carburettorKinds ? { carburettorKinds: [...c.carburettorKinds] } : {}),
      fixes: [...c.fixes],
    })),
    checks,
    fixes: catalog.fixes.map((f) => ({ id: f.id, label: f.label, minutes: f.minutes, cautions: cautionsOf(compiled, f.cautions), steps: [...f.steps], tools: [...f.tools] })),
    cautions: catalog.cautions.map((c) => compiled.cautionById.get(c.id)!),
    somethingElse: { label: catalog.somethingElse.label, prior: catalog.somethingElse.prior },
  };
}

export interface RankOptions {
  /** The day of the diagnosis (for foam and rebuild ages); `asOf` in the request, else now. */
  now?: Date;
}

export interface PreparedRequest {
  request: NormalisedRankRequest;
  facts: Map<string, unknown>;
  /** Index buckets to run for this request. */
  buckets: string[];
}

export function validateWith(compiled: CompiledRuleset, input: unknown): RankRequestValidation {
  return validateRankRequest(input, compiled.catalog, compiled.lookups);
}

/** Validates (throwing `RankRequestError`), normalises and computes the facts of a request. */
export function prepare(compiled: CompiledRuleset, input: unknown, options: RankOptions = {}): PreparedRequest {
  const validation = validateWith(compiled, input);
  if (!validation.ok || !validation.request) throw new RankRequestError(validation);
  const request = validation.request;
  const now = options.now ?? (request.asOf ? new Date(request.asOf) : new Date());
  const facts = computeFacts(request, now);
  const buckets = [ALWAYS_BUCKET, ...request.symptoms.map((s) => `symptom:${s.id}`), ...Object.keys(request.results).map((c) => `check:${c}`)];
  for (const [id, value] of facts) if (value !== undefined) buckets.push(`fact:${id}`);
  return { request, facts, buckets: buckets.filter((b) => compiled.buckets.has(b)) };
}

/** Rule positions to evaluate for a prepared request (all rules when `indexed` is false). */
export function candidateRules(compiled: CompiledRuleset, prepared: PreparedRequest, indexed = true): number[] {
  if (!indexed) return compiled.rules.map((r) => r.position);
  const out: number[] = [];
  for (const b of prepared.buckets) out.push(...compiled.buckets.get(b)!);
  return out;
}

const byStrength = (a: ReasonDto, b: ReasonDto) => Math.abs(b.logOdds) - Math.abs(a.logOdds);

/** Belief, Bayes updates on check results, the plan and the stop finding, from the fired rules. */
export function assembleResponse(compiled: CompiledRuleset, request: NormalisedRankRequest, firedPositions: readonly number[]): RankResponse {
  const { catalog } = compiled;
  const kind = request.setup.carburettorKind;
  const elsePrior = catalog.somethingElse.prior;

  // Causes that cannot occur on this carburettor kind are left out.
  const causes: CatalogCause[] = [];
  const excluded: RankResponse['excluded'] = [];
  for (const c of catalog.causes) {
    if (kind && c.carburettorKinds && !c.carburettorKinds.includes(kind)) {
      excluded.push({ id: c.id, label: c.label, reason: `Not found on a ${kind} carburettor` });
    } else causes.push(c);
  }
  const slot = new Map(causes.map((c, i) => [c.id, i]));
  const logOdds = causes.map((c) => priorLogOdds(c.prior, elsePrior));
  const reasons: ReasonDto[][] = causes.map(() => []);

  // Fired rules. `mentioned` holds, per symptom, the causes a fired rule on it spoke about.
  const mentioned = new Map<string, Set<string>>();
  const stops: StopFinding[] = [];
  const fired = [...firedPositions].sort((a, b) => a - b);
  for (const pos of fired) {
    const { def, requiresSymptoms } = compiled.rules[pos];
    if (def.event.type === 'stop') {
      stops.push({ reason: `${def.event.params.reason} ${catalog.stopAdvice}`, checkId: def.event.params.check, ruleId: def.name });
      continue;
    }
    const { cause, lr, reason } = def.event.params;
    const i = slot.get(cause);
    if (i === undefined) continue;
    const l = Math.log(lr);
    logOdds[i] += l;
    reasons[i].push({ kind: 'rule', text: reason, likelihoodRatio: lr, logOdds: l, ruleId: def.name });
    for (const s of requiresSymptoms) {
      const set = mentioned.get(s);
      if (set) set.add(cause);
      else mentioned.set(s, new Set([cause]));
    }
  }

  // Reported symptoms a cause does not usually give.
  for (const s of request.symptoms) {
    const symptom = compiled.symptomById.get(s.id)!;
    if (symptom.otherCausesLr === 1) continue;
    const l = Math.log(symptom.otherCausesLr);
    const spoken = mentioned.get(s.id);
    const text = compiled.unexplainedText.get(s.id)!;
    for (let i = 0; i < causes.length; i++) {
      if (spoken?.has(causes[i].id)) continue;
      logOdds[i] += l;
      reasons[i].push({ kind: 'unexplained', text, likelihoodRatio: symptom.otherCausesLr, logOdds: l, symptomId: s.id });
    }
  }

  // Check results, by Bayes' rule.
  for (const [checkId, result] of Object.entries(request.results)) {
    if (result === 'not-checked') continue;
    const check = compiled.checkById.get(checkId)!;
    for (const t of check.tests) {
      const i = slot.get(t.cause);
      if (i === undefined) continue;
      const lr = checkResultLr(t.sensitivity, check.specificity, result);
      const l = Math.log(lr);
      logOdds[i] += l;
      reasons[i].push({
        kind: 'check',
        text: `${check.label}: ${result === 'fault-found' ? 'fault found' : 'looks fine'}`,
        likelihoodRatio: lr,
        logOdds: l,
        checkId,
      });
    }
  }

  const { probabilities, somethingElse } = probabilitiesFromLogOdds(logOdds);
  const ranked: RankedCause[] = causes.map((c, i) => ({
    id: c.id,
    label: c.label,
    probability: probabilities[i],
    prior: c.prior,
    logOdds: logOdds[i],
    reasons: reasons[i].sort(byStrength),
    fixes: [...c.fixes],
  }));
  ranked.sort((a, b) => b.probability - a.probability || (a.id < b.id ? -1 : 1));

  const symptomCautions = [...new Map(request.symptoms.flatMap((s) => compiled.symptomCautions.get(s.id)!).map((c) => [c.id, c])).values()];
  const base = {
    version: compiled.ruleset.version,
    causes: ranked,
    somethingElse: { label: catalog.somethingElse.label, probability: somethingElse },
    excluded,
    cautions: [...symptomCautions.filter((c) => c.severity === 'stop'), ...symptomCautions.filter((c) => c.severity !== 'stop')],
  };
  if (stops.length) return { ...base, plan: [], expectedMinutes: 0, stop: stops[0] };
  const { plan, expectedMinutes } = planChecks(compiled, request, new Map(causes.map((c, i) => [c.id, probabilities[i]])));
  return { ...base, plan, expectedMinutes };
}

interface PlanCandidate extends PlanAction {
  check: CatalogCheck;
  causes: string[];
  safetyFirst: boolean;
}

/** Orders the checks still to do by the bottom-up P-over-C rule; safety checks lead. */
export function planChecks(compiled: CompiledRuleset, request: NormalisedRankRequest, probability: ReadonlyMap<string, number>): { plan: PlanStep[]; expectedMinutes: number } {
  const kind = request.setup.carburettorKind;
  const reported = new Set(request.symptoms.map((s) => s.id));
  const candidates: PlanCandidate[] = [];
  for (const check of compiled.catalog.checks) {
    if (request.results[check.id] !== undefined) continue;
    if (kind && check.carburettorKinds && !check.carburettorKinds.includes(kind)) continue;
    let p = 0;
    const tested: { id: string; p: number }[] = [];
    for (const t of check.tests) {
      const pc = probability.get(t.cause);
      if (pc === undefined) continue;
      p += pc * t.sensitivity;
      tested.push({ id: t.cause, p: pc });
    }
    const first = check.firstWhen;
    const safetyFirst = Boolean(first && (first.always || first.symptoms?.some((s) => reported.has(s))));
    if (p < MIN_FIND_PROBABILITY && !safetyFirst) continue;
    tested.sort((a, b) => b.p - a.p);
    candidates.push({ id: check.id, group: check.group, probability: p, cost: check.minutes, check, causes: tested.map((t) => t.id), safetyFirst });
  }
  const opening = (g: string) => compiled.groupOpening.get(g) ?? 0;
  const ordered = bottomUpPOverC(candidates, opening);
  const final = [...ordered.filter((c) => c.safetyFirst), ...ordered.filter((c) => !c.safetyFirst)];
  const opened = new Set<string>();
  const plan: PlanStep[] = final.map((c) => {
    const opens = !opened.has(c.group);
    opened.add(c.group);
    return {
      checkId: c.id,
      label: c.check.label,
      group: c.check.group,
      minutes: c.check.minutes,
      openingMinutes: opens ? opening(c.group) : 0,
      cautions: compiled.checkCautions.get(c.id)!,
      findProbability: c.probability,
      causes: c.causes,
      safetyFirst: c.safetyFirst,
    };
  });
  return { plan, expectedMinutes: expectedCost(final, opening) };
}
