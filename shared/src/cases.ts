/**
 * Case contracts (/api/cases). A case is one running problem on one kart. It is never changed in
 * place: every step is an appended event (who, when, what), and the case is the replay of them.
 */
import type { CheckResultValue, DiagnosisConditions, RankResponse, StopFinding, SymptomInput, SymptomReport } from './diagnosis.js';
import type { SetupSnapshot } from './setup.js';
import type { RecommendationDto } from './sharing.js';

export const CASE_STATES = ['open', 'resolved', 'abandoned', 'stopped'] as const;
export type CaseState = (typeof CASE_STATES)[number];

export const CASE_STATE_LABELS: Record<CaseState, string> = {
  open: 'Open',
  resolved: 'Resolved',
  abandoned: 'Abandoned',
  stopped: 'Stopped: see an engine builder',
};

export const CASE_EVENT_TYPES = ['opened', 'symptoms-reported', 'check-recorded', 'resolved', 'abandoned', 'stopped', 'check-recommended', 'facts-corrected'] as const;
export type CaseEventType = (typeof CASE_EVENT_TYPES)[number];

export const CASE_NOTE_MAX_LENGTH = 1000;

/** POST /api/cases */
export interface OpenCaseRequest {
  kartId: string;
  /** Bare symptom ids or { id, band, engine, where }; stored as the latter. */
  symptoms: SymptomInput[];
  /** The setup at the time; when absent, the kart's latest snapshot is used. */
  setup?: SetupSnapshot;
  conditions?: DiagnosisConditions;
  /** Checks already done before the case was saved (a visitor's quick diagnosis). */
  results?: { checkId: string; result: CheckResultValue; note?: string }[];
}

/**
 * PUT /api/cases/:id/facts: corrects what an open case was opened with (a setup entered wrong,
 * the day's air measured later). Each part given replaces the case's; the carburettor kind stays
 * the kart's. The ranking is made again with the results so far; the opening ranking is kept.
 */
export interface CorrectCaseFactsRequest {
  setup?: SetupSnapshot;
  conditions?: DiagnosisConditions;
}

/** PUT /api/cases/:id/symptoms */
export interface ReportSymptomsRequest {
  symptoms: SymptomInput[];
}

/** POST /api/cases/:id/results */
export interface RecordCheckResultRequest {
  checkId: string;
  result: CheckResultValue;
  note?: string;
}

/** POST /api/cases/:id/resolve: what fixed it. `causeId` is a catalog cause or "something-else". */
export interface ResolveCaseRequest {
  causeId: string;
  fix: string;
  note?: string;
}

/** POST /api/cases/:id/abandon */
export interface AbandonCaseRequest {
  reason?: string;
}

export interface CheckResultEntry {
  checkId: string;
  result: CheckResultValue;
  note: string;
  at: string;
  by: string;
}

export interface CaseResolution {
  causeId: string;
  fix: string;
  note: string;
  at: string;
  by: string;
}

export interface CaseEventDto {
  seq: number;
  type: CaseEventType;
  at: string;
  actorId: string | null;
  actorName: string;
  /** One line for the timeline. */
  summary: string;
  payload: Record<string, unknown>;
  /** Top causes right after this step (id, probability), for the timeline. */
  topCauses?: { id: string; probability: number }[];
}

export interface CaseSummaryDto {
  id: string;
  kartId: string;
  kartName: string;
  ownerId: string;
  ownerName: string;
  state: CaseState;
  rulesetVersion: string;
  symptomIds: string[];
  topCauseId: string | null;
  topCauseProbability: number | null;
  openedAt: string;
  updatedAt: string;
}

export interface CaseDto extends CaseSummaryDto {
  symptoms: SymptomReport[];
  setup: SetupSnapshot;
  conditions: DiagnosisConditions;
  /** The latest result of each check, in the order recorded. */
  results: CheckResultEntry[];
  /** The ranking and plan after the last step, under the case's ruleset version. */
  rank: RankResponse;
  /** The ranking when the case was opened (what outcomes are measured against). */
  openingRank: RankResponse;
  resolution: CaseResolution | null;
  stop: StopFinding | null;
  abandonedReason: string | null;
  /** Checks recommended by a shared coach or shop (pending ones lead `rank.plan`). */
  recommendations: RecommendationDto[];
  events: CaseEventDto[];
}

export interface CaseListResponse {
  cases: CaseSummaryDto[];
}
