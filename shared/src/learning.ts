/** Shop outcomes, insights and ruleset versions (/api/work-orders, /api/outcomes, /api/insights, /api/rulesets). */
import type { SetupSnapshot } from './setup.js';
import type { SymptomInput, SymptomReport } from './diagnosis.js';

export interface CreateWorkOrderRequest {
  /** A case shared with the shop; or leave it out for a walk-in and give the rest. */
  caseId?: string;
  customerName?: string;
  kartDescription?: string;
  symptoms?: SymptomInput[];
  setup?: SetupSnapshot;
  notes?: string;
}

export interface WorkOrderDto {
  id: string;
  caseId: string | null;
  customerName: string;
  kartDescription: string;
  symptoms: SymptomReport[];
  /** The setup the kart came in with: the case's at the time, or what the shop entered for a walk-in (may be empty). */
  setup: SetupSnapshot;
  status: 'open' | 'done';
  notes: string;
  createdAt: string;
  outcomes: number;
}

export interface LogOutcomeRequest {
  caseId?: string;
  workOrderId?: string;
  /** Catalog cause ids, or "something-else" (then say what in `otherNote`). */
  confirmedCauses: string[];
  otherNote?: string;
  fix: string;
  parts?: string;
  labourMinutes?: number;
  /** Still fixed after the next session? Leave out until known. */
  stillFixed?: boolean;
  /** The outcome this entry corrects. */
  supersedesId?: string;
}

export interface OutcomeDto {
  id: string;
  caseId: string | null;
  workOrderId: string | null;
  rulesetVersion: string;
  symptomIds: string[];
  topCauseId: string | null;
  confirmedCauses: string[];
  otherNote: string;
  fix: string;
  parts: string;
  labourMinutes: number | null;
  stillFixed: boolean | null;
  supersedesId: string | null;
  /** False when a later entry corrects this one. */
  current: boolean;
  loggedByName: string;
  demo: boolean;
  at: string;
}

/** An outcome as its case lists it for one reader. */
export interface CaseOutcomeDto extends OutcomeDto {
  /** Logged by the reader: theirs to correct (entries by others are shown, not offered for correction). */
  yours: boolean;
}

/** GET /api/cases/:id/outcomes: every entry logged on the case, newest first, corrected ones with `current: false`. */
export interface CaseOutcomesResponse {
  outcomes: CaseOutcomeDto[];
}

/** One published ruleset version (immutable once published). */
export interface RulesetVersionInfo {
  version: string;
  parentVersion: string | null;
  notes: string;
  active: boolean;
  publishedAt: string;
  publishedBy: string | null;
  rules: number;
  causes: number;
}

/** GET /api/rulesets (shop, admin). */
export interface RulesetsResponse {
  /** The version new cases are ranked with. */
  active: string;
  /** Oldest first. */
  versions: RulesetVersionInfo[];
}

export interface StartProposalRequest {
  /** Pseudo-count of the expert values: how many outcomes' worth of weight the current priors and ratios keep. */
  strength: number;
  /** The version the proposal would be published as, e.g. 1.1.0. */
  version: string;
  holdOutFraction?: number;
  seed?: number;
}

export interface ProposalDto {
  id: string;
  baseVersion: string;
  proposedVersion: string;
  strength: number;
  seed: number;
  holdOutFraction: number;
  status: 'running' | 'ready' | 'failed' | 'published' | 'discarded';
  progress: number;
  error: string | null;
  createdAt: string;
  finishedAt: string | null;
  /** When ready: the diff (old, proposed, evidence) and the back-test, as computed by the rules package. */
  result: ProposalResult | null;
}

/** One ruleset's accuracy on a proposal's held-out outcomes (shares 0..1; Brier null when nothing was ranked). */
export type BackTestFigures = Pick<RankingAccuracy, 'top1Rate' | 'top3Rate' | 'brier'>;

/** A proposal in the list: no diff and no evidence, only the back-test's headline figures once ready. */
export interface ProposalSummaryDto extends Omit<ProposalDto, 'result'> {
  /** Who started it (null when that account is gone). */
  createdByName: string | null;
  /** Ready and published proposals: before (base version) and after (proposed weights). */
  backTest: { heldOut: number; scored: number; before: BackTestFigures; after: BackTestFigures } | null;
}

/** GET /api/rulesets/proposals: the newest proposals first (at most PROPOSAL_LIST_LIMIT). */
export interface ProposalListResponse {
  proposals: ProposalSummaryDto[];
}

export const PROPOSAL_LIST_LIMIT = 50;

/*
 * The insight figures as GET /api/insights sends them (computed by the rules package's metric
 * accumulators, rules/src/learning/metrics.ts, whose types the service checks against these). A
 * figure that has no value (a mean over nothing) is NaN there and arrives as null.
 */

export interface RankingAccuracy {
  ranked: number;
  top1: number;
  top3: number;
  top1Rate: number;
  top3Rate: number;
  /** Mean multi-category Brier score, 0 (certain and right) to 2 (certain and wrong). */
  brier: number | null;
}

export interface CalibrationBin {
  from: number;
  to: number;
  count: number;
  meanPredicted: number | null;
  observed: number | null;
}

export interface Calibration {
  bins: CalibrationBin[];
  count: number;
  expectedCalibrationError: number | null;
}

export interface SymptomCausePair {
  symptom: string;
  cause: string;
  outcomes: number;
  shareOfSymptom: number;
}

export interface LabourByCause {
  cause: string;
  outcomes: number;
  meanMinutes: number;
  sdMinutes: number | null;
  minMinutes: number;
  maxMinutes: number;
}

export interface WrongWayRule {
  rule: string;
  cause: string;
  lr: number;
  direction: 'for' | 'against';
  fired: number;
  wrongWay: number;
  wrongWayRate: number;
}

export interface Insights {
  rulesetVersion: string;
  outcomes: number;
  skipped: number;
  withCase: number;
  walkIns: number;
  ranked: number;
  accuracy: RankingAccuracy;
  calibration: Calibration;
  topLabelCalibration: Calibration;
  symptomCausePairs: SymptomCausePair[];
  labourByCause: LabourByCause[];
  wrongWayRules: { rules: WrongWayRule[]; unknownRuleFirings: number };
  confirmed: { cause: string; outcomes: number }[];
  stillFixed: { yes: number; no: number; unknown: number };
}

export interface InsightsResponse {
  version: string;
  from: string | null;
  to: string | null;
  /** Cases opened in the period under this version. */
  cases: number;
  outcomes: number;
  insights: Insights;
}

/*
 * A ready proposal's `result`, as the rules package computes it (rules/src/learning/refine.ts),
 * without the ruleset source, which the server keeps to publish.
 */

/** Top-1, top-3 and Brier score of a ruleset on the held-out outcomes. */
export type Accuracy = RankingAccuracy;

export interface PriorChange {
  cause: string;
  old: number;
  proposed: number;
  changed: boolean;
  evidence: {
    outcomes: number;
    weight: number;
    imputed: number;
    interval: [number, number];
    oldOutsideInterval: boolean;
  };
}

export interface RuleChange {
  rule: string;
  file: string;
  cause: string;
  old: number;
  proposed: number;
  changed: boolean;
  evidence: {
    outcomes: number;
    causeOutcomes: number;
    causeFired: number;
    referenceOutcomes: number;
    referenceFired: number;
    parents: string[];
    interval: [number, number];
    oldOutsideInterval: boolean;
    capped: boolean;
    kept: boolean;
    flat: boolean;
  };
}

export interface ProposalResult {
  fromVersion: string;
  version: string;
  priors: PriorChange[];
  rules: RuleChange[];
  changedPriors: number;
  changedRules: number;
  fit: { read: number; outcomes: number; withFiredRules: number; skipped: { noKnownCause: number; notStillFixed: number } };
  backTest: { heldOut: number; scored: number; skipped: number; before: Accuracy; after: Accuracy };
  settings: { strength: number; seed: number | string; holdOutFraction: number; intervalMass: number; draws: number };
}

