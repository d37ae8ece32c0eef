/**
 * Diagnosis contracts: GET /api/catalog and POST /api/diagnosis/rank.
 * The ranking and check planning live in @fuelwright/rules; these are the shapes on the wire.
 */
import type { CarburettorKind } from './karts.js';
import type { EngineTemp, SetupSnapshot, ThrottleBand, TrackPosition } from './setup.js';

/** What a check found. `not-checked` ("could not check") updates nothing but takes the check off the plan. */
export const CHECK_RESULT_VALUES = ['fault-found', 'looks-fine', 'not-checked'] as const;
export type CheckResultValue = (typeof CHECK_RESULT_VALUES)[number];

export const CHECK_RESULT_LABELS: Record<CheckResultValue, string> = {
  'fault-found': 'Fault found',
  'looks-fine': 'Looks fine',
  'not-checked': 'Could not check',
};

/** `caution`: read before doing the step. `stop`: if this happens, stop work and do not drive. */
export const CAUTION_SEVERITIES = ['caution', 'stop'] as const;
export type CautionSeverity = (typeof CAUTION_SEVERITIES)[number];

/**
 * Disassembly groups. Opening a group (fuel lines off, float bowl off, carburettor top off,
 * spark plug out) costs its own minutes once, whatever number of checks then use it.
 */
export const CHECK_GROUPS = ['outside', 'fuel-lines', 'float-bowl', 'carb-top', 'spark-plug'] as const;
export type CheckGroup = (typeof CHECK_GROUPS)[number];

/** The details a symptom can carry: throttle band, engine temperature, where on track. */
export const SYMPTOM_DIMENSIONS = ['band', 'engine', 'where'] as const;
export type SymptomDimension = (typeof SYMPTOM_DIMENSIONS)[number];

/** The id of the catch-all hypothesis that is not in the catalog's causes. */
export const SOMETHING_ELSE_ID = 'something-else';

// ---------------------------------------------------------------------------------------------
// GET /api/catalog
// ---------------------------------------------------------------------------------------------

export interface CautionDto {
  id: string;
  severity: CautionSeverity;
  title: string;
  text: string;
}

export interface SymptomDto {
  id: string;
  label: string;
  description: string;
  /** Which details make sense for this symptom (band, engine, where). */
  dimensions: SymptomDimension[];
  /** Cautions to show as soon as the symptom is reported (e.g. a throttle slow to return). */
  cautions: CautionDto[];
}

export interface CauseDto {
  id: string;
  label: string;
  description: string;
  /** Prior probability before any evidence (relative weight among the causes and "something else"). */
  prior: number;
  /** Carburettor kinds the cause can occur on; absent means every kind. */
  carburettorKinds?: CarburettorKind[];
  /** Ids of the fixes for this cause. */
  fixes: string[];
}

export interface CheckTestDto {
  /** Cause the check can confirm (fault found) or make less likely (looks fine). */
  cause: string;
  /** P(fault found | this cause is the fault). */
  sensitivity: number;
}

export interface CheckDto {
  id: string;
  label: string;
  group: CheckGroup;
  /** Minutes for the check itself, once its group is open. */
  minutes: number;
  /** Cautions come first: show them before the steps. */
  cautions: CautionDto[];
  steps: string[];
  tools: string[];
  /** What to write down while doing the check. */
  record: string[];
  /** What counts as "fault found" and as "looks fine" for this check. */
  faultFoundMeans: string;
  looksFineMeans: string;
  tests: CheckTestDto[];
  /** P(looks fine | none of the tested causes is the fault). */
  specificity: number;
  carburettorKinds?: CarburettorKind[];
  /** True when "fault found" on this check ends the walk-through (see `RankResponse.stop`). */
  stopOnFault: boolean;
}

export interface CheckGroupDto {
  id: CheckGroup;
  label: string;
  /** Minutes to open the group, paid once. */
  openingMinutes: number;
  steps: string[];
  cautions: CautionDto[];
}

export interface FixDto {
  id: string;
  label: string;
  minutes: number;
  cautions: CautionDto[];
  steps: string[];
  tools: string[];
}

export interface LabelledId<T extends string = string> {
  id: T;
  label: string;
}

export interface CatalogResponse {
  /** Ruleset version the catalog belongs to (echoed by every rank response). */
  version: string;
  throttleBands: (LabelledId<ThrottleBand> & { circuit: string })[];
  engineTemps: LabelledId<EngineTemp>[];
  trackPositions: LabelledId<TrackPosition>[];
  groups: CheckGroupDto[];
  symptoms: SymptomDto[];
  causes: CauseDto[];
  checks: CheckDto[];
  fixes: FixDto[];
  cautions: CautionDto[];
  somethingElse: { label: string; prior: number };
}

// ---------------------------------------------------------------------------------------------
// POST /api/diagnosis/rank
// ---------------------------------------------------------------------------------------------

/** A symptom with where it shows. Each detail takes one value or several. */
export interface SymptomReport {
  id: string;
  band?: ThrottleBand | ThrottleBand[];
  engine?: EngineTemp | EngineTemp[];
  where?: TrackPosition | TrackPosition[];
}

/** A bare symptom id, or a symptom with where it shows. */
export type SymptomInput = string | SymptomReport;

/** Air figures for one day (any subset; the density is what the ranking uses). */
export interface AirFigures {
  /** Moist-air density, kg/m3 (as POST /api/conditions/air computes it). */
  densityKgM3?: number;
  temperatureC?: number;
  /** Absolute pressure at the track, hPa. */
  stationPressureHpa?: number;
  relativeHumidityPct?: number;
}

export interface DiagnosisConditions {
  /**
   * Air density today against the day the setup was last right, in percent:
   * `100 * (densityToday - densityThen) / densityThen`. POSITIVE = DENSER air today (colder,
   * higher pressure or drier), which leans the mixture; negative = thinner air, which richens it.
   * When absent it is computed from `today` and `reference`: each day's `densityKgM3`, or else
   * its temperature, station pressure and humidity (CIPM-2007 moist-air density); a day missing
   * any of those leaves the change unknown.
   */
  densityChangePct?: number;
  /** Today's air. */
  today?: AirFigures;
  /** The air on the day the setup was last right. */
  reference?: AirFigures;
  /** Days since the fuel in the tank was mixed. */
  fuelAgeDays?: number;
}

export interface RankRequest {
  /** Symptom ids from the catalog, bare or with where they show. May be empty. */
  symptoms: SymptomInput[];
  setup?: SetupSnapshot;
  conditions?: DiagnosisConditions;
  /** Results of checks already done, by check id. */
  results?: Record<string, CheckResultValue>;
  /** Engine displacement, cc; rules about usual jet sizes apply only near 80 cc or when it is unknown. */
  engineDisplacementCc?: number;
  /** Date the diagnosis is for (ISO `YYYY-MM-DD`); today when absent. Used for foam and rebuild ages. */
  asOf?: string;
}

/** One piece of evidence behind a cause's probability. */
export interface ReasonDto {
  /** `rule`: a fired rule; `check`: a check result (Bayes' rule); `unexplained`: a reported symptom this cause does not usually give. */
  kind: 'rule' | 'check' | 'unexplained';
  text: string;
  /** Factor on the odds of this cause against "something else". */
  likelihoodRatio: number;
  /** Natural log of `likelihoodRatio`: the contribution to the log-odds. */
  logOdds: number;
  ruleId?: string;
  checkId?: string;
  symptomId?: string;
}

export interface RankedCause {
  id: string;
  label: string;
  /** Posterior probability, 0..1 (all causes plus "something else" sum to 1). */
  probability: number;
  prior: number;
  /** Log-odds against "something else" after all evidence. */
  logOdds: number;
  /** Strongest contributions first. */
  reasons: ReasonDto[];
  fixes: string[];
}

export interface PlanStep {
  checkId: string;
  label: string;
  group: CheckGroup;
  /** Minutes of the check itself. */
  minutes: number;
  /** Minutes to open the group, when this step is the first of its group in the plan (else 0). */
  openingMinutes: number;
  /** Show these before the steps. */
  cautions: CautionDto[];
  /** Probability this check finds the fault, given the current belief. */
  findProbability: number;
  /** Causes this check tests, most probable first. */
  causes: string[];
  /** Placed first for safety, ahead of the cost order. */
  safetyFirst: boolean;
  /** Set on a saved case when a shared coach or shop recommended this check: it is moved to the top. */
  recommendation?: { by: string; byName: string; reason: string };
}

export interface StopFinding {
  /** Plain words: what was found, "Do not drive; see a qualified engine builder", local rules. */
  reason: string;
  checkId: string;
  ruleId: string;
}

export interface ExcludedCause {
  id: string;
  label: string;
  reason: string;
}

/**
 * The answer of POST /api/diagnosis/rank (and the ranking stored with each case step).
 * The stable minimum a client may rely on: `version`, `causes[].{id,label,probability,reasons}`,
 * `plan[].{checkId,label,group,minutes,cautions}` and `stop.reason` when a finding ends the
 * walk-through. Every response also carries the extras below (`somethingElse`, `excluded`,
 * `expectedMinutes`, `cautions`; per cause `prior`, `logOdds`, `fixes`; per step `openingMinutes`,
 * `findProbability`, `causes`, `safetyFirst`). Clients must ignore fields they do not know.
 * `causes` leaves out the "something else" bucket and the `excluded` causes, so its probabilities
 * sum to 1 minus `somethingElse.probability`. The OpenAPI schema (service/src/diagnosis/openapi-schemas.ts)
 * says the same.
 */
export interface RankResponse {
  version: string;
  /** Causes, most probable first; without "something else" and without `excluded`. */
  causes: RankedCause[];
  somethingElse: { label: string; probability: number };
  /** Causes left out because they cannot occur on this carburettor kind. */
  excluded: ExcludedCause[];
  /** Checks still to do, in order; empty after a stop finding. */
  plan: PlanStep[];
  /** Expected minutes to find the fault if the plan is followed (including group opening). */
  expectedMinutes: number;
  /** Cautions raised by the reported symptoms themselves; show them first. */
  cautions: CautionDto[];
  /** Set when a finding ends the walk-through. */
  stop?: StopFinding;
}
