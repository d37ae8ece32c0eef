/**
 * Operators the rules may use. The built-in ones keep json-rules-engine's meaning exactly
 * (including its fact-value guards), the two custom ones (`shows`, `resultIs`) are registered
 * with the engine; the plain evaluator uses this same table, so both paths agree by construction.
 */
import type { FactType, CheckResultIndex, SymptomIndex } from './facts.js';

/** Value of a `shows` condition: the symptom, and optionally where it must show. */
export interface ShowsValue {
  symptom: string;
  band?: string[];
  engine?: string[];
  where?: string[];
}

/** Value of a `resultIs` condition. */
export interface ResultIsValue {
  check: string;
  result: string;
}

function overlaps(wanted: readonly string[] | undefined, reported: readonly string[]): boolean {
  if (!wanted) return true;
  for (const w of wanted) if (reported.includes(w)) return true;
  return false;
}

/**
 * True when the symptom was reported and, for each detail the rule names, the report names at
 * least one of the same values. A report that leaves a detail out does not match a rule that
 * needs it: the general rule for the symptom still applies.
 */
export function shows(index: SymptomIndex, value: ShowsValue): boolean {
  const s = index.get(value.symptom);
  if (!s) return false;
  return overlaps(value.band, s.bands) && overlaps(value.engine, s.engine) && overlaps(value.where, s.where);
}

function within(wanted: readonly string[] | undefined, reported: readonly string[]): boolean {
  if (!wanted) return true;
  if (reported.length === 0) return false;
  for (const r of reported) if (!wanted.includes(r)) return false;
  return true;
}

/**
 * True when the symptom was reported and, for each detail the rule names, the report names that
 * detail and every value it names is in the rule's list: "shows only there". Used for evidence
 * against a circuit when the symptom shows only away from it.
 */
export function showsOnly(index: SymptomIndex, value: ShowsValue): boolean {
  const s = index.get(value.symptom);
  if (!s) return false;
  return within(value.band, s.bands) && within(value.engine, s.engine) && within(value.where, s.where);
}

export function resultIs(index: CheckResultIndex, value: ResultIsValue): boolean {
  return index.get(value.check) === value.result;
}

// json-rules-engine's number guard: `Number.parseFloat(factValue).toString() !== 'NaN'`.
const isNumberLike = (v: unknown): boolean => Number.parseFloat(v as string).toString() !== 'NaN';

type OperatorFn = (factValue: any, value: any) => boolean;

/** Every operator: its evaluation (with json-rules-engine's guard for the built-ins). */
export const OPERATORS: Readonly<Record<string, OperatorFn>> = {
  equal: (a, b) => a === b,
  notEqual: (a, b) => a !== b,
  in: (a, b) => b.indexOf(a) > -1,
  notIn: (a, b) => b.indexOf(a) === -1,
  lessThan: (a, b) => isNumberLike(a) && a < b,
  lessThanInclusive: (a, b) => isNumberLike(a) && a <= b,
  greaterThan: (a, b) => isNumberLike(a) && a > b,
  greaterThanInclusive: (a, b) => isNumberLike(a) && a >= b,
  shows: (a, b) => shows(a, b),
  showsOnly: (a, b) => showsOnly(a, b),
  resultIs: (a, b) => resultIs(a, b),
};

/** The custom operators to register with json-rules-engine. */
export const CUSTOM_OPERATORS: Readonly<Record<'shows' | 'showsOnly' | 'resultIs', OperatorFn>> = {
  shows: OPERATORS.shows,
  showsOnly: OPERATORS.showsOnly,
  resultIs: OPERATORS.resultIs,
};

/** Operators allowed with each kind of fact. */
export const OPERATORS_BY_FACT_KIND: Readonly<Record<FactType['kind'], readonly string[]>> = {
  number: ['equal', 'notEqual', 'lessThan', 'lessThanInclusive', 'greaterThan', 'greaterThanInclusive', 'in', 'notIn'],
  enum: ['equal', 'notEqual', 'in', 'notIn'],
  boolean: ['equal', 'notEqual'],
  symptoms: ['shows', 'showsOnly'],
  checkResults: ['resultIs'],
};
