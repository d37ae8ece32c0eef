/**
 * The knowledge base's data model: the catalog (symptoms, causes, checks, fixes, cautions, groups)
 * and the rules, as the JSON files hold them, with the zod schemas that check their shape.
 * Cross-references (a rule naming a cause, a check naming a caution ...) are checked in
 * `validate.ts`, which also checks rule conditions against the known facts.
 */
import { z } from 'zod';
import {
  CARBURETTOR_KINDS,
  CAUTION_SEVERITIES,
  CHECK_GROUPS,
  CHECK_RESULT_VALUES,
  SYMPTOM_DIMENSIONS,
  type CarburettorKind,
  type CautionSeverity,
  type CheckGroup,
  type CheckResultValue,
  type SymptomDimension,
} from '@fuelwright/shared';

/** Kinds of hazard a check or fix involves; each one requires certain cautions (see `HAZARD_CAUTIONS`). */
export const HAZARDS = ['fuel', 'hot-engine', 'engine-on-stand', 'track-run', 'throttle', 'lean-running'] as const;
export type Hazard = (typeof HAZARDS)[number];

/**
 * Cautions a check or fix must carry for each hazard it declares. Opening the fuel lines or the
 * float bowl always handles fuel; taking the spark plug out always involves a hot engine.
 */
export const HAZARD_CAUTIONS: Record<Hazard, readonly string[]> = {
  fuel: ['fuel-flammable'],
  'hot-engine': ['hot-engine'],
  'engine-on-stand': ['engine-on-stand', 'throttle-snap-back'],
  'track-run': ['throttle-snap-back'],
  throttle: ['throttle-snap-back'],
  'lean-running': ['lean-seizure'],
};
export const GROUP_HAZARDS: Partial<Record<CheckGroup, readonly Hazard[]>> = {
  'fuel-lines': ['fuel'],
  'float-bowl': ['fuel'],
  'spark-plug': ['hot-engine'],
};

const id = z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'must be a kebab-case id (a-z, 0-9, single hyphens)');
const text = z.string().trim().min(1, 'must not be empty');
const probability = z.number().gt(0, 'must be greater than 0').lt(1, 'must be less than 1');
const minutes = z.number().min(0, 'must not be negative').max(240, 'must be at most 240 minutes');

export const cautionSchema = z.strictObject({
  id,
  severity: z.enum(CAUTION_SEVERITIES),
  title: text,
  text,
});

export const groupSchema = z.strictObject({
  id: z.enum(CHECK_GROUPS),
  label: text,
  openingMinutes: minutes,
  steps: z.array(text),
  cautions: z.array(id),
});

export const symptomSchema = z.strictObject({
  id,
  label: text,
  description: text,
  dimensions: z.array(z.enum(SYMPTOM_DIMENSIONS)),
  /**
   * Likelihood ratio applied to every cause no fired rule links with this symptom: how much more
   * (or less) likely the symptom is under such a cause than under "something else".
   */
  otherCausesLr: z.number().gt(0, 'must be greater than 0').max(1, 'must be at most 1'),
  cautions: z.array(id),
});

export const causeSchema = z.strictObject({
  id,
  label: text,
  description: text,
  prior: probability,
  carburettorKinds: z.array(z.enum(CARBURETTOR_KINDS)).min(1).optional(),
  fixes: z.array(id),
});

export const checkTestSchema = z.strictObject({
  cause: id,
  sensitivity: probability,
});

export const checkSchema = z.strictObject({
  id,
  label: text,
  group: z.enum(CHECK_GROUPS),
  minutes: minutes.gt(0, 'must be greater than 0'),
  hazards: z.array(z.enum(HAZARDS)),
  cautions: z.array(id),
  steps: z.array(text).min(1, 'needs at least one step'),
  tools: z.array(text),
  record: z.array(text),
  faultFoundMeans: text,
  looksFineMeans: text,
  tests: z.array(checkTestSchema).min(1, 'must test at least one cause'),
  specificity: probability,
  carburettorKinds: z.array(z.enum(CARBURETTOR_KINDS)).min(1).optional(),
  firstWhen: z
    .strictObject({
      always: z.boolean().optional(),
      symptoms: z.array(id).optional(),
    })
    .optional(),
});

export const fixSchema = z.strictObject({
  id,
  label: text,
  minutes: minutes.gt(0, 'must be greater than 0'),
  hazards: z.array(z.enum(HAZARDS)),
  cautions: z.array(id),
  steps: z.array(text).min(1, 'needs at least one step'),
  tools: z.array(text),
});

export const catalogSchema = z.strictObject({
  version: z.string().regex(/^[0-9A-Za-z.+-]{1,40}$/, 'must be a version string such as 1.0.0'),
  stopAdvice: text,
  somethingElse: z.strictObject({ label: text, prior: probability }),
  groups: z.array(groupSchema),
  cautions: z.array(cautionSchema),
  symptoms: z.array(symptomSchema).min(1),
  causes: z.array(causeSchema).min(1),
  checks: z.array(checkSchema),
  fixes: z.array(fixSchema),
});

export type CatalogCaution = z.infer<typeof cautionSchema>;
export type CatalogGroup = z.infer<typeof groupSchema>;
export type CatalogSymptom = z.infer<typeof symptomSchema>;
export type CatalogCause = z.infer<typeof causeSchema>;
export type CatalogCheck = z.infer<typeof checkSchema>;
export type CatalogFix = z.infer<typeof fixSchema>;
export type Catalog = z.infer<typeof catalogSchema>;

/** A likelihood-ratio event: the rule's evidence for one cause. */
export interface LikelihoodEvent {
  type: 'likelihood';
  params: { cause: string; lr: number; reason: string };
}
/** A stop event: a finding that ends the walk-through. */
export interface StopEvent {
  type: 'stop';
  params: { check: string; reason: string };
}
export type RuleEvent = LikelihoodEvent | StopEvent;

/** A json-rules-engine leaf condition as our rules use it (no `path`, no `params`). */
export interface LeafCondition {
  fact: string;
  operator: string;
  value: unknown;
  name?: string;
  priority?: number;
}
export type Condition = LeafCondition | AllCondition | AnyCondition | NotCondition;
export interface AllCondition {
  all: Condition[];
  name?: string;
  priority?: number;
}
export interface AnyCondition {
  any: Condition[];
  name?: string;
  priority?: number;
}
export interface NotCondition {
  not: Condition;
  name?: string;
  priority?: number;
}
export type TopCondition = AllCondition | AnyCondition | NotCondition;

/** A validated rule, with where it came from. */
export interface RuleDefinition {
  name: string;
  /** File it came from, relative to the ruleset folder (`rules/pump-around.json`). */
  file: string;
  /** Position in its file, from 0. */
  index: number;
  conditions: TopCondition;
  event: RuleEvent;
}

/** A validated, immutable ruleset: what `buildDiagnosisEngine` takes. */
export interface Ruleset {
  version: string;
  catalog: Catalog;
  rules: RuleDefinition[];
  /** Rule file descriptions by file name (kept so the ruleset can be written back out). */
  files: Record<string, { theme: string; description: string }>;
}

/** The raw JSON of a ruleset: the catalog file and the rule files by file name. */
export interface RulesetSource {
  catalog: unknown;
  ruleFiles: Record<string, unknown>;
}

export const ruleFileSchema = z.strictObject({
  theme: text,
  description: text,
  rules: z.array(z.unknown()),
});

const ruleName = z.string().regex(/^[a-z0-9]+(--?[a-z0-9]+)*$/, 'must be a kebab-case name (a-z, 0-9, hyphens; "--" may separate parts)');

export const ruleShapeSchema = z.strictObject({
  name: ruleName,
  conditions: z.unknown(),
  event: z.unknown(),
});

export const likelihoodEventSchema = z.strictObject({
  type: z.literal('likelihood'),
  params: z.strictObject({
    cause: id,
    lr: z
      .number()
      .gt(0, 'must be greater than 0')
      .min(0.01, 'must be at least 0.01')
      .max(100, 'must be at most 100')
      .refine((v) => v !== 1, 'must not be 1 (a ratio of 1 changes nothing)'),
    reason: text.max(200, 'must be one line (at most 200 characters)'),
  }),
});

export const stopEventSchema = z.strictObject({
  type: z.literal('stop'),
  params: z.strictObject({
    check: id,
    reason: text.max(200, 'must be one line (at most 200 characters)'),
  }),
});

export type { CarburettorKind, CautionSeverity, CheckGroup, CheckResultValue, SymptomDimension };
export { CHECK_RESULT_VALUES };
