/**
 * The ruleset validator. It rejects a bad catalog or rule file with the file, the rule (name and
 * position) or catalog entry, and the field named, and collects every problem rather than
 * stopping at the first. A ruleset that passes can be handed to `buildDiagnosisEngine`.
 */
import type { z } from 'zod';
import {
  CHECK_GROUPS,
  CHECK_RESULT_VALUES,
  ENGINE_TEMPS,
  THROTTLE_BANDS,
  TRACK_POSITIONS,
} from '@fuelwright/shared';
import { FACTS_BY_ID, type FactType } from './facts.js';
import {
  GROUP_HAZARDS,
  HAZARD_CAUTIONS,
  catalogSchema,
  likelihoodEventSchema,
  ruleFileSchema,
  ruleShapeSchema,
  stopEventSchema,
  type Catalog,
  type Hazard,
  type RuleDefinition,
  type RuleEvent,
  type Ruleset,
  type RulesetSource,
  type TopCondition,
} from './model.js';
import { OPERATORS_BY_FACT_KIND } from './operators.js';

export const CATALOG_FILE = 'catalog.json';

/** One problem found in a ruleset. */
export interface RulesetIssue {
  /** File relative to the ruleset folder: `catalog.json` or `rules/<theme>.json`. */
  file: string;
  /** The rule (`"name" (#index)`) or catalog entry (`checks[3] "foam-inspect"`), when the problem is inside one. */
  rule?: string;
  /** Dotted path of the field inside the rule or entry (or file). */
  field: string;
  message: string;
}

export function formatIssue(issue: RulesetIssue): string {
  return [issue.file, issue.rule, issue.field, issue.message].filter((part) => part !== undefined && part !== '').join(': ');
}

export class RulesetValidationError extends Error {
  readonly issues: RulesetIssue[];
  constructor(issues: RulesetIssue[]) {
    const head = issues.slice(0, 20).map(formatIssue).join('\n  ');
    const more = issues.length > 20 ? `\n  ... and ${issues.length - 20} more` : '';
    super(`Ruleset is not valid (${issues.length} problem${issues.length === 1 ? '' : 's'}):\n  ${head}${more}`);
    this.name = 'RulesetValidationError';
    this.issues = issues;
  }
}

function pathOf(path: readonly PropertyKey[]): string {
  return path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '');
}

function zodIssues(error: z.ZodError, file: string, prefix: string, describe?: (path: readonly PropertyKey[]) => { rule?: string; rest: readonly PropertyKey[] }): RulesetIssue[] {
  return error.issues.map((i) => {
    const located = describe ? describe(i.path) : { rest: i.path };
    const field = [prefix, pathOf(located.rest)].filter(Boolean).join('.') || '(file)';
    return { file, rule: located.rule, field, message: i.message };
  });
}

/** Validates the catalog on its own. Returns the typed catalog, or every problem found as `issues`. */
export function validateCatalog(raw: unknown): { catalog?: Catalog; issues: RulesetIssue[] } {
  const file = CATALOG_FILE;
  const parsed = catalogSchema.safeParse(raw);
  if (!parsed.success) {
    const lists = new Set(['groups', 'cautions', 'symptoms', 'causes', 'checks', 'fixes']);
    const entries = raw as Record<string, unknown[] | undefined> | null;
    return {
      issues: zodIssues(parsed.error, file, '', (path) => {
        const [list, index, ...rest] = path;
        if (typeof list === 'string' && lists.has(list) && typeof index === 'number') {
          const item = entries?.[list]?.[index] as { id?: unknown } | undefined;
          const label = typeof item?.id === 'string' ? ` "${item.id}"` : '';
          return { rule: `${list}[${index}]${label}`, rest };
        }
        return { rest: path };
      }),
    };
  }
  const catalog = parsed.data;
  const issues: RulesetIssue[] = [];
  const at = (list: string, index: number, entryId: string) => `${list}[${index}] "${entryId}"`;
  const add = (rule: string | undefined, field: string, message: string) => issues.push({ file, rule, field, message });

  const idSet = (list: string, items: { id: string }[]) => {
    const seen = new Set<string>();
    items.forEach((item, i) => {
      if (seen.has(item.id)) add(at(list, i, item.id), 'id', `duplicate id "${item.id}"`);
      seen.add(item.id);
    });
    return seen;
  };
  const cautionIds = idSet('cautions', catalog.cautions);
  const symptomIds = idSet('symptoms', catalog.symptoms);
  const causeIds = idSet('causes', catalog.causes);
  idSet('checks', catalog.checks);
  const fixIds = idSet('fixes', catalog.fixes);
  const groupIds = idSet('groups', catalog.groups);
  for (const g of CHECK_GROUPS) if (!groupIds.has(g)) add(undefined, 'groups', `missing group "${g}"`);

  const checkCautions = (rule: string, cautions: string[]) =>
    cautions.forEach((c, j) => {
      if (!cautionIds.has(c)) add(rule, `cautions[${j}]`, `unknown caution "${c}"`);
    });
  const checkHazards = (rule: string, hazards: Hazard[], cautions: string[], implied: readonly Hazard[] = []) => {
    for (const hazard of new Set([...hazards, ...implied])) {
      for (const needed of HAZARD_CAUTIONS[hazard]) {
        if (!cautions.includes(needed)) {
          const why = hazards.includes(hazard) ? `hazard "${hazard}"` : `its group (hazard "${hazard}")`;
          add(rule, 'cautions', `must include caution "${needed}" because of ${why}`);
        }
      }
    }
  };

  catalog.groups.forEach((g, i) => checkCautions(at('groups', i, g.id), g.cautions));
  catalog.symptoms.forEach((s, i) => checkCautions(at('symptoms', i, s.id), s.cautions));
  catalog.causes.forEach((c, i) =>
    c.fixes.forEach((f, j) => {
      if (!fixIds.has(f)) add(at('causes', i, c.id), `fixes[${j}]`, `unknown fix "${f}"`);
    }),
  );
  catalog.fixes.forEach((f, i) => {
    checkCautions(at('fixes', i, f.id), f.cautions);
    checkHazards(at('fixes', i, f.id), f.hazards, f.cautions);
  });
  const tested = new Set<string>();
  catalog.checks.forEach((check, i) => {
    const rule = at('checks', i, check.id);
    checkCautions(rule, check.cautions);
    checkHazards(rule, check.hazards, check.cautions, GROUP_HAZARDS[check.group]);
    const seen = new Set<string>();
    check.tests.forEach((t, j) => {
      if (!causeIds.has(t.cause)) add(rule, `tests[${j}].cause`, `unknown cause "${t.cause}"`);
      if (seen.has(t.cause)) add(rule, `tests[${j}].cause`, `cause "${t.cause}" listed twice`);
      seen.add(t.cause);
      tested.add(t.cause);
      if (t.sensitivity <= 1 - check.specificity + 1e-9) {
        add(rule, `tests[${j}].sensitivity`, `must be greater than 1 - specificity (${(1 - check.specificity).toFixed(2)}), else a found fault would not point at the cause`);
      }
    });
    check.firstWhen?.symptoms?.forEach((s, j) => {
      if (!symptomIds.has(s)) add(rule, `firstWhen.symptoms[${j}]`, `unknown symptom "${s}"`);
    });
  });
  catalog.causes.forEach((c, i) => {
    if (!tested.has(c.id)) add(at('causes', i, c.id), 'id', 'no check tests this cause');
  });
  return issues.length ? { issues } : { catalog, issues };
}

interface RefSets {
  symptoms: Set<string>;
  causes: Set<string>;
  checks: Set<string>;
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function checkEnumList(value: unknown, allowed: readonly string[], field: string, out: (field: string, message: string) => void) {
  if (!Array.isArray(value) || value.length === 0) {
    out(field, 'must be a non-empty list');
    return;
  }
  value.forEach((v, i) => {
    if (typeof v !== 'string' || !allowed.includes(v)) out(`${field}[${i}]`, `must be one of ${allowed.join(', ')}`);
  });
}

function checkLeafValue(type: FactType, operator: string, value: unknown, field: string, refs: RefSets, out: (field: string, message: string) => void) {
  const listOps = operator === 'in' || operator === 'notIn';
  switch (type.kind) {
    case 'number': {
      const values = listOps ? value : [value];
      if (!Array.isArray(values) || values.length === 0) return out(field, `must be a non-empty list of numbers for "${operator}"`);
      values.forEach((v, i) => {
        const f = listOps ? `${field}[${i}]` : field;
        if (typeof v !== 'number' || !Number.isFinite(v)) out(f, 'must be a number');
        else if (type.range && (v < type.range.min || v > type.range.max)) out(f, `must be within ${type.range.min}..${type.range.max}`);
      });
      return;
    }
    case 'enum': {
      const values = listOps ? value : [value];
      if (!Array.isArray(values) || values.length === 0) return out(field, `must be a non-empty list for "${operator}"`);
      values.forEach((v, i) => {
        if (typeof v !== 'string' || !type.values.includes(v)) out(listOps ? `${field}[${i}]` : field, `must be one of ${type.values.join(', ')}`);
      });
      return;
    }
    case 'boolean':
      if (typeof value !== 'boolean') out(field, 'must be true or false');
      return;
    case 'symptoms': {
      if (!isObject(value)) return out(field, 'must be an object { symptom, band?, engine?, where? }');
      for (const key of Object.keys(value)) {
        if (!['symptom', 'band', 'engine', 'where'].includes(key)) out(`${field}.${key}`, 'is not allowed (use symptom, band, engine, where)');
      }
      if (typeof value.symptom !== 'string') out(`${field}.symptom`, 'must be a symptom id');
      else if (!refs.symptoms.has(value.symptom)) out(`${field}.symptom`, `unknown symptom "${value.symptom}"`);
      if (value.band !== undefined) checkEnumList(value.band, THROTTLE_BANDS, `${field}.band`, out);
      if (value.engine !== undefined) checkEnumList(value.engine, ENGINE_TEMPS, `${field}.engine`, out);
      if (value.where !== undefined) checkEnumList(value.where, TRACK_POSITIONS, `${field}.where`, out);
      if (operator === 'showsOnly' && value.band === undefined && value.engine === undefined && value.where === undefined) {
        out(field, '"showsOnly" needs band, engine or where (else use "shows")');
      }
      return;
    }
    case 'checkResults': {
      if (!isObject(value)) return out(field, 'must be an object { check, result }');
      for (const key of Object.keys(value)) {
        if (!['check', 'result'].includes(key)) out(`${field}.${key}`, 'is not allowed (use check, result)');
      }
      if (typeof value.check !== 'string') out(`${field}.check`, 'must be a check id');
      else if (!refs.checks.has(value.check)) out(`${field}.check`, `unknown check "${value.check}"`);
      if (typeof value.result !== 'string' || !(CHECK_RESULT_VALUES as readonly string[]).includes(value.result)) {
        out(`${field}.result`, `must be one of ${CHECK_RESULT_VALUES.join(', ')}`);
      }
      return;
    }
  }
}

function checkCondition(node: unknown, field: string, refs: RefSets, out: (field: string, message: string) => void, top = false): void {
  if (!isObject(node)) return out(field, 'must be a condition object');
  const bool = ['all', 'any', 'not'].filter((k) => k in node);
  if ('condition' in node) return out(`${field}.condition`, 'condition references are not supported: write the condition out');
  if (bool.length > 1) return out(field, `must hold only one of all, any, not (found ${bool.join(', ')})`);
  for (const key of ['name', 'priority']) {
    if (key in node && key === 'priority' && (typeof node.priority !== 'number' || !Number.isInteger(node.priority) || node.priority < 1)) {
      out(`${field}.priority`, 'must be a whole number of at least 1');
    }
    if (key in node && key === 'name' && typeof node.name !== 'string') out(`${field}.name`, 'must be a string');
  }
  if (bool.length === 1) {
    const op = bool[0];
    for (const key of Object.keys(node)) {
      if (![op, 'name', 'priority'].includes(key)) out(`${field}.${key}`, `is not allowed beside "${op}"`);
    }
    const inner = node[op];
    if (op === 'not') {
      if (Array.isArray(inner)) return out(`${field}.not`, 'must be one condition, not a list');
      return checkCondition(inner, `${field}.not`, refs, out);
    }
    if (!Array.isArray(inner) || inner.length === 0) return out(`${field}.${op}`, 'must be a non-empty list of conditions');
    inner.forEach((c, i) => checkCondition(c, `${field}.${op}[${i}]`, refs, out));
    return;
  }
  if (top) return out(field, 'must start with all, any or not');
  for (const key of Object.keys(node)) {
    if (key === 'path' || key === 'params') out(`${field}.${key}`, `"${key}" is not supported: facts are plain values`);
    else if (!['fact', 'operator', 'value', 'name', 'priority'].includes(key)) out(`${field}.${key}`, 'is not allowed in a condition');
  }
  if (typeof node.fact !== 'string') return out(`${field}.fact`, 'must name a fact');
  const fact = FACTS_BY_ID.get(node.fact);
  if (!fact) return out(`${field}.fact`, `unknown fact "${node.fact}"`);
  if (typeof node.operator !== 'string') return out(`${field}.operator`, 'must name an operator');
  const allowed = OPERATORS_BY_FACT_KIND[fact.type.kind];
  if (!allowed.includes(node.operator)) {
    return out(`${field}.operator`, `operator "${node.operator}" cannot be used with fact "${node.fact}" (use ${allowed.join(', ')})`);
  }
  if (!('value' in node)) return out(`${field}.value`, 'is required');
  if (isObject(node.value) && 'fact' in node.value) return out(`${field}.value`, 'must be a literal value, not another fact');
  checkLeafValue(fact.type, node.operator, node.value, `${field}.value`, refs, out);
}

function checkRule(raw: unknown, file: string, index: number, refs: RefSets, names: Map<string, string>, issues: RulesetIssue[]): RuleDefinition | undefined {
  const name = isObject(raw) && typeof raw.name === 'string' ? raw.name : undefined;
  const rule = name !== undefined ? `rule "${name}" (#${index})` : `rule #${index}`;
  const before = issues.length;
  const out = (field: string, message: string) => issues.push({ file, rule, field, message });
  const shape = ruleShapeSchema.safeParse(raw);
  if (!shape.success) {
    issues.push(...zodIssues(shape.error, file, '', (path) => ({ rule, rest: path })));
    return undefined;
  }
  if (names.has(shape.data.name)) out('name', `duplicate rule name (also in ${names.get(shape.data.name)})`);
  else names.set(shape.data.name, file);
  checkCondition(shape.data.conditions, 'conditions', refs, out, true);

  let event: RuleEvent | undefined;
  const ev = shape.data.event;
  const type = isObject(ev) ? ev.type : undefined;
  if (type === 'likelihood') {
    const parsed = likelihoodEventSchema.safeParse(ev);
    if (!parsed.success) parsed.error.issues.forEach((i) => out(`event.${pathOf(i.path)}`, i.message));
    else if (!refs.causes.has(parsed.data.params.cause)) out('event.params.cause', `unknown cause "${parsed.data.params.cause}"`);
    else event = parsed.data;
  } else if (type === 'stop') {
    const parsed = stopEventSchema.safeParse(ev);
    if (!parsed.success) parsed.error.issues.forEach((i) => out(`event.${pathOf(i.path)}`, i.message));
    else if (!refs.checks.has(parsed.data.params.check)) out('event.params.check', `unknown check "${parsed.data.params.check}"`);
    else event = parsed.data;
  } else {
    out('event.type', 'must be "likelihood" or "stop"');
  }
  if (issues.length > before || !event) return undefined;
  return { name: shape.data.name, file, index, conditions: shape.data.conditions as TopCondition, event };
}

/**
 * Validates a whole ruleset (catalog and rule files). Throws `RulesetValidationError` listing
 * every problem; returns the validated, deep-frozen ruleset otherwise.
 */
export function validateRuleset(source: RulesetSource): Ruleset {
  const { catalog, issues } = validateCatalog(source.catalog);
  if (!catalog) throw new RulesetValidationError(issues);
  const refs: RefSets = {
    symptoms: new Set(catalog.symptoms.map((s) => s.id)),
    causes: new Set(catalog.causes.map((c) => c.id)),
    checks: new Set(catalog.checks.map((c) => c.id)),
  };
  const rules: RuleDefinition[] = [];
  const files: Ruleset['files'] = {};
  const names = new Map<string, string>();
  const fileNames = Object.keys(source.ruleFiles).sort();
  if (fileNames.length === 0) issues.push({ file: 'rules/', field: '(folder)', message: 'no rule files' });
  for (const file of fileNames) {
    if (!/^rules\/[a-z0-9-]+\.json$/.test(file)) {
      issues.push({ file, field: '(file name)', message: 'rule files live under rules/ and are named like rules/<theme>.json' });
      continue;
    }
    const parsed = ruleFileSchema.safeParse(source.ruleFiles[file]);
    if (!parsed.success) {
      issues.push(...zodIssues(parsed.error, file, ''));
      continue;
    }
    files[file] = { theme: parsed.data.theme, description: parsed.data.description };
    parsed.data.rules.forEach((raw, index) => {
      const rule = checkRule(raw, file, index, refs, names, issues);
      if (rule) rules.push(rule);
    });
  }
  if (issues.length) throw new RulesetValidationError(issues);
  const ruleset = deepFreeze({ version: catalog.version, catalog, rules, files });
  validated.add(ruleset);
  return ruleset;
}

const validated = new WeakSet<Ruleset>();

/** The ruleset itself when `validateRuleset` produced it; otherwise it is validated now (and throws if bad). */
export function ensureValidated(ruleset: Ruleset): Ruleset {
  return validated.has(ruleset) ? ruleset : validateRuleset(toRulesetSource(ruleset));
}

/** Freezes an object and everything reachable from it. */
export function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    if (value instanceof Map) for (const v of value.values()) deepFreeze(v);
    else for (const v of Object.values(value as object)) deepFreeze(v);
  }
  return value;
}

/** The JSON files of a ruleset, to store or publish a (re-fitted) version. */
export function toRulesetSource(ruleset: Ruleset): RulesetSource & { version: string } {
  const ruleFiles: Record<string, { theme: string; description: string; rules: unknown[] }> = {};
  for (const [file, meta] of Object.entries(ruleset.files)) ruleFiles[file] = { ...meta, rules: [] };
  for (const rule of ruleset.rules) {
    ruleFiles[rule.file].rules[rule.index] = { name: rule.name, conditions: rule.conditions, event: rule.event };
  }
  return JSON.parse(JSON.stringify({ version: ruleset.version, catalog: ruleset.catalog, ruleFiles }));
}
