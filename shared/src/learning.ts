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
  result: unknown;
}

/** One ruleset's accuracy on a proposal's held-out outcomes (shares 0..1). */
export interface BackTestFigures {
  top1Rate: number;
  top3Rate: number;
  /** Mean Brier score; null when nothing was ranked. */
  brier: number | null;
}

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
