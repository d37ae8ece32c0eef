/**
 * The rank request: its schema, the check of its ids against a catalog, and normalisation
 * (details as lists, duplicate symptoms merged, nulls read as "not known").
 * `validateRankRequest` gives the service everything it needs for a 400: unknown ids per field
 * and messages per dotted field path (the `fields` of `ApiErrorBody`).
 */
import { z } from 'zod';
import {
  CARBURETTOR_KINDS,
  CHECK_RESULT_VALUES,
  DISPLACEMENT_RANGE_CC,
  ENGINE_TEMPS,
  IDLE_SCREW_STATES,
  SETUP_RANGES,
  THROTTLE_BANDS,
  TRACK_POSITIONS,
  isCalendarDate,
  isNotInFuture,
  type CheckResultValue,
  type DiagnosisConditions,
  type NumericRange,
  type SetupSnapshot,
} from '@fuelwright/shared';
import type { NormalisedRankRequest, NormalisedSymptom } from './facts.js';
import type { Catalog } from './model.js';

export const MAX_SYMPTOMS = 40;
export const MAX_RESULTS = 200;

const ranged = (r: NumericRange) =>
  z
    .number({ error: 'must be a number' })
    .min(r.min, `must be at least ${r.min}`)
    .max(r.max, `must be at most ${r.max}`)
    .nullish();

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}(T[0-9:.]+(Z|[+-]\d{2}:\d{2})?)?$/, 'must be an ISO date (YYYY-MM-DD)')
  .refine((s) => isCalendarDate(s.slice(0, 10)) && !Number.isNaN(Date.parse(s)), 'must be a real date');

/** A date the racer looks back on (foam fitted, last rebuild): not later than today where they are. */
const pastDate = isoDate.refine((s) => isNotInFuture(s), 'must not be in the future');

const oneOrMany = <const T extends readonly [string, ...string[]]>(values: T) =>
  z.union([z.enum(values), z.array(z.enum(values)).min(1).max(values.length)], { error: `must be one or more of ${values.join(', ')}` });

const symptomId = z.string().min(1, 'must not be empty').max(80, 'must be at most 80 characters');

export const symptomInputSchema = z.union(
  [
    symptomId,
    z.strictObject({
      id: symptomId,
      band: oneOrMany(THROTTLE_BANDS).optional(),
      engine: oneOrMany(ENGINE_TEMPS).optional(),
      where: oneOrMany(TRACK_POSITIONS).optional(),
    }),
  ],
  { error: 'must be a symptom id or { id, band?, engine?, where? }' },
);

export const setupSchema = z.strictObject({
  carburettorKind: z.enum(CARBURETTOR_KINDS).nullish(),
  mainJet: ranged(SETUP_RANGES.mainJet),
  pilotJet: ranged(SETUP_RANGES.pilotJet),
  needleClipGroove: ranged(SETUP_RANGES.needleClipGroove).refine((v) => v == null || Number.isInteger(v), 'must be a whole groove number'),
  airScrewTurnsOut: ranged(SETUP_RANGES.airScrewTurnsOut),
  idleScrew: z.enum(IDLE_SCREW_STATES).nullish(),
  idleScrewTurns: ranged(SETUP_RANGES.idleScrewTurns),
  foamFittedDate: pastDate.nullish(),
  lastRebuildDate: pastDate.nullish(),
  premixRatio: ranged(SETUP_RANGES.premixRatio),
  ventLinesFitted: z.boolean().nullish(),
  ventLinesRoutedUp: z.boolean().nullish(),
});

const airFigures = z.strictObject({
  densityKgM3: ranged({ min: 0.5, max: 1.6 }),
  temperatureC: ranged({ min: -40, max: 60 }),
  stationPressureHpa: ranged({ min: 500, max: 1100 }),
  relativeHumidityPct: ranged({ min: 0, max: 100 }),
});

export const conditionsSchema = z.strictObject({
  densityChangePct: ranged({ min: -50, max: 50 }),
  today: airFigures.nullish(),
  reference: airFigures.nullish(),
  fuelAgeDays: ranged({ min: 0, max: 3650 }),
});

/** The shape of a rank request (ids are checked against the catalog separately). */
export const rankRequestSchema = z.strictObject({
  symptoms: z.array(symptomInputSchema, { error: 'must be a list of symptoms' }).max(MAX_SYMPTOMS, `must hold at most ${MAX_SYMPTOMS} symptoms`),
  setup: setupSchema.nullish(),
  conditions: conditionsSchema.nullish(),
  results: z
    .record(z.string().min(1).max(80), z.enum(CHECK_RESULT_VALUES, { error: `must be one of ${CHECK_RESULT_VALUES.join(', ')}` }))
    .refine((r) => Object.keys(r).length <= MAX_RESULTS, `must hold at most ${MAX_RESULTS} results`)
    .nullish(),
  engineDisplacementCc: ranged(DISPLACEMENT_RANGE_CC),
  asOf: isoDate.nullish(),
});

export interface RankRequestValidation {
  ok: boolean;
  /** Ids that are not in the catalog, per field of the request. */
  unknown: { symptoms: string[]; checks: string[] };
  /** Messages per dotted field path (`symptoms.2.id`, `results.foam-look`, `setup.mainJet`). */
  fields: Record<string, string[]>;
  /** One line for an error message. */
  message: string;
  /** The normalised request, when `ok`. */
  request?: NormalisedRankRequest;
}

export class RankRequestError extends Error {
  readonly validation: RankRequestValidation;
  constructor(validation: RankRequestValidation) {
    super(validation.message);
    this.name = 'RankRequestError';
    this.validation = validation;
  }
}

function asList<T>(v: T | T[] | undefined): T[] {
  if (v === undefined) return [];
  return Array.isArray(v) ? [...new Set(v)] : [v];
}

function dropNulls<T extends object>(o: T | null | undefined): T {
  const out: Record<string, unknown> = {};
  if (o) for (const [k, v] of Object.entries(o)) if (v !== null && v !== undefined) out[k] = v;
  return out as T;
}

/** Checks a rank request's shape and ids against a catalog, and normalises it. */
export function validateRankRequest(input: unknown, catalog: Catalog, lookups?: { symptoms: ReadonlySet<string>; checks: ReadonlySet<string> }): RankRequestValidation {
  const fields: Record<string, string[]> = {};
  const add = (field: string, message: string) => (fields[field] ??= []).push(message);
  const unknown = { symptoms: [] as string[], checks: [] as string[] };
  const parsed = rankRequestSchema.safeParse(input);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) add(issue.path.map(String).join('.') || '(body)', issue.message);
    return { ok: false, unknown, fields, message: `Invalid rank request: ${Object.keys(fields).join(', ')}` };
  }
  const body = parsed.data;
  const symptomIds = lookups?.symptoms ?? new Set(catalog.symptoms.map((s) => s.id));
  const checkIds = lookups?.checks ?? new Set(catalog.checks.map((c) => c.id));

  const merged = new Map<string, NormalisedSymptom>();
  body.symptoms.forEach((s, i) => {
    const report = typeof s === 'string' ? { id: s } : s;
    if (!symptomIds.has(report.id)) {
      if (!unknown.symptoms.includes(report.id)) unknown.symptoms.push(report.id);
      add(typeof s === 'string' ? `symptoms.${i}` : `symptoms.${i}.id`, `unknown symptom "${report.id}"`);
      return;
    }
    const prev = merged.get(report.id) ?? { id: report.id, bands: [], engine: [], where: [] };
    merged.set(report.id, {
      id: report.id,
      bands: [...new Set([...prev.bands, ...asList(typeof s === 'string' ? undefined : s.band)])],
      engine: [...new Set([...prev.engine, ...asList(typeof s === 'string' ? undefined : s.engine)])],
      where: [...new Set([...prev.where, ...asList(typeof s === 'string' ? undefined : s.where)])],
    });
  });
  const results: Record<string, CheckResultValue> = {};
  for (const [checkId, value] of Object.entries(body.results ?? {})) {
    if (!checkIds.has(checkId)) {
      unknown.checks.push(checkId);
      add(`results.${checkId}`, `unknown check "${checkId}"`);
    } else results[checkId] = value;
  }
  if (unknown.symptoms.length || unknown.checks.length) {
    const parts = [
      unknown.symptoms.length ? `unknown symptom${unknown.symptoms.length > 1 ? 's' : ''}: ${unknown.symptoms.join(', ')}` : '',
      unknown.checks.length ? `unknown check${unknown.checks.length > 1 ? 's' : ''}: ${unknown.checks.join(', ')}` : '',
    ].filter(Boolean);
    return { ok: false, unknown, fields, message: `Invalid rank request: ${parts.join('; ')}` };
  }
  const conditions = dropNulls(body.conditions) as DiagnosisConditions;
  if (conditions.today) conditions.today = dropNulls(conditions.today);
  if (conditions.reference) conditions.reference = dropNulls(conditions.reference);
  const request: NormalisedRankRequest = {
    symptoms: [...merged.values()],
    setup: dropNulls(body.setup) as SetupSnapshot,
    conditions,
    results,
    engineDisplacementCc: body.engineDisplacementCc ?? undefined,
    asOf: body.asOf ?? undefined,
  };
  return { ok: true, unknown, fields, message: 'ok', request };
}
