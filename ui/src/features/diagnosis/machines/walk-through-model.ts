/**
 * Pure pieces of the guided walk-through: the intake's setup draft and its checks, the plan order
 * with skipped checks moved to the end, the "previous check" for Back, and the error shape the
 * machine keeps (plain data, so a persisted snapshot stays JSON).
 */
import {
  SETUP_RANGES,
  type CarburettorKind,
  type CaseDto,
  type CheckResultValue,
  type IdleScrewState,
  type PlanStep,
  type RankResponse,
  type SetupSnapshot,
  type SymptomReport,
} from '@fuelwright/shared';
import { RECORDED_SETUP_FIELDS } from '../../../lib/setup-fields';

export type WalkThroughMode = 'quick' | 'case';

/** One recorded check result, in the order recorded (latest result per check). */
export interface RecordedResult {
  checkId: string;
  result: CheckResultValue;
  note: string;
}

export interface Resolution {
  causeId: string;
  fix: string;
  note: string;
}

/** A server error kept as plain data: message, status (0 = no answer) and per-field messages. */
export interface WalkThroughError {
  status: number;
  message: string;
  fields: Record<string, string[]>;
}

/** The cause probabilities before the last step, to show what changed. */
export interface CauseProbability {
  id: string;
  probability: number;
}

// ---------------------------------------------------------------------------------------------
// Setup draft: what the racer typed, as text, until the intake is sent
// ---------------------------------------------------------------------------------------------

export const SETUP_NUMBER_FIELDS = ['mainJet', 'pilotJet', 'needleClipGroove', 'airScrewTurnsOut', 'idleScrewTurns', 'premixRatio'] as const;
export const SETUP_DATE_FIELDS = ['foamFittedDate', 'lastRebuildDate'] as const;
export const SETUP_YES_NO_FIELDS = ['ventLinesFitted', 'ventLinesRoutedUp'] as const;
export type SetupNumberField = (typeof SETUP_NUMBER_FIELDS)[number];
export type SetupDateField = (typeof SETUP_DATE_FIELDS)[number];
export type SetupYesNoField = (typeof SETUP_YES_NO_FIELDS)[number];
export type SetupDraftField = SetupNumberField | SetupDateField | SetupYesNoField | 'idleScrew';

/** Every setup value as typed: numbers and dates as text, yes/no as 'yes' | 'no', '' = not known. */
export type SetupDraft = Partial<Record<SetupDraftField, string>>;

/** Every recorded setup field (all but the kart's carburettor kind), in display order. */
export const SETUP_DRAFT_FIELDS: readonly SetupDraftField[] = RECORDED_SETUP_FIELDS;

/** Field names, in trade words, for messages. */
export const SETUP_FIELD_NAMES: Record<SetupDraftField, string> = {
  mainJet: 'Main jet',
  pilotJet: 'Pilot jet',
  needleClipGroove: 'Needle clip groove',
  airScrewTurnsOut: 'Air screw turns out',
  idleScrew: 'Idle screw',
  idleScrewTurns: 'Idle screw turns',
  foamFittedDate: 'Bowl foam fitted on',
  lastRebuildDate: 'Last carburettor rebuild',
  premixRatio: 'Premix ratio',
  ventLinesFitted: 'Vent lines fitted',
  ventLinesRoutedUp: 'Vent lines routed up',
};

const WHOLE_NUMBER_FIELDS = new Set<SetupNumberField>(['needleClipGroove']);

/** Today as an ISO calendar date in the viewer's time zone. */
export function todayIso(now: Date = new Date()): string {
  const local = new Date(now.getTime() - now.getTimezoneOffset() * 60_000);
  return local.toISOString().slice(0, 10);
}

/** The setup values of a snapshot as draft text (the carburettor kind is kept apart). */
export function draftFromSetup(setup: Omit<SetupSnapshot, 'carburettorKind'> | null | undefined): SetupDraft {
  const draft: SetupDraft = {};
  if (!setup) return draft;
  for (const field of SETUP_NUMBER_FIELDS) {
    const value = setup[field];
    if (typeof value === 'number') draft[field] = String(value);
  }
  for (const field of SETUP_DATE_FIELDS) {
    const value = setup[field];
    if (typeof value === 'string' && value !== '') draft[field] = value;
  }
  for (const field of SETUP_YES_NO_FIELDS) {
    const value = setup[field];
    if (typeof value === 'boolean') draft[field] = value ? 'yes' : 'no';
  }
  if (setup.idleScrew) draft.idleScrew = setup.idleScrew;
  return draft;
}

export interface SetupParse {
  setup: Omit<SetupSnapshot, 'carburettorKind'>;
  /** Messages by field name (the same names the server uses under `setup.`). */
  errors: Partial<Record<SetupDraftField, string>>;
}

/** Reads the draft into a setup snapshot, with one plain message per field that cannot be read. */
export function parseSetupDraft(draft: SetupDraft, today: string = todayIso()): SetupParse {
  const setup: Omit<SetupSnapshot, 'carburettorKind'> = {};
  const errors: SetupParse['errors'] = {};
  for (const field of SETUP_NUMBER_FIELDS) {
    const text = (draft[field] ?? '').trim().replace(',', '.');
    if (text === '') continue;
    const value = Number(text);
    const range = SETUP_RANGES[field];
    if (!Number.isFinite(value)) {
      errors[field] = `${SETUP_FIELD_NAMES[field]}: enter a number, for example ${range.min === 0 ? 1.5 : range.min}.`;
    } else if (WHOLE_NUMBER_FIELDS.has(field) && !Number.isInteger(value)) {
      errors[field] = `${SETUP_FIELD_NAMES[field]}: a whole number of grooves, ${range.min} to ${range.max}.`;
    } else if (value < range.min || value > range.max) {
      errors[field] = `${SETUP_FIELD_NAMES[field]}: between ${range.min} and ${range.max}.`;
    } else {
      setup[field] = value;
    }
  }
  for (const field of SETUP_DATE_FIELDS) {
    const text = (draft[field] ?? '').trim();
    if (text === '') continue;
    if (!/^\d{4}-\d{2}-\d{2}$/.test(text) || Number.isNaN(Date.parse(`${text}T00:00:00Z`))) {
      errors[field] = `${SETUP_FIELD_NAMES[field]}: a date like ${today}.`;
    } else if (text > today) {
      errors[field] = `${SETUP_FIELD_NAMES[field]}: cannot be in the future.`;
    } else {
      setup[field] = text;
    }
  }
  for (const field of SETUP_YES_NO_FIELDS) {
    const text = draft[field];
    if (text === 'yes' || text === 'no') setup[field] = text === 'yes';
  }
  const idle = draft.idleScrew;
  if (idle === 'backed-off' || idle === 'set') setup.idleScrew = idle satisfies IdleScrewState;
  if (setup.idleScrew !== 'set') delete setup.idleScrewTurns;
  if (setup.ventLinesFitted === false) delete setup.ventLinesRoutedUp;
  return { setup, errors };
}

/** The symptoms as the API takes them: only the details that were picked. */
export function symptomsForRequest(symptoms: readonly SymptomReport[]): SymptomReport[] {
  const picked = <T,>(value: T | T[] | undefined): value is T | T[] => (Array.isArray(value) ? value.length > 0 : value !== undefined);
  return symptoms.map(({ id, band, engine, where }) => ({
    id,
    ...(picked(band) ? { band } : {}),
    ...(picked(engine) ? { engine } : {}),
    ...(picked(where) ? { where } : {}),
  }));
}

// ---------------------------------------------------------------------------------------------
// Plan and navigation between checks
// ---------------------------------------------------------------------------------------------

/** The plan in walking order: the server's order, with the checks skipped for now moved to the end. */
export function orderedPlan(rank: RankResponse | null, skipped: readonly string[]): PlanStep[] {
  if (!rank) return [];
  const skippedSet = new Set(skipped);
  const first = rank.plan.filter((step) => !skippedSet.has(step.checkId));
  const later = skipped.map((id) => rank.plan.find((step) => step.checkId === id)).filter((step): step is PlanStep => step !== undefined);
  return [...first, ...later];
}

/** The check to do next, or null when the plan is done. */
export function nextCheckId(rank: RankResponse | null, skipped: readonly string[]): string | null {
  return orderedPlan(rank, skipped)[0]?.checkId ?? null;
}

/**
 * The check Back goes to: the one recorded before the current one (when the current one was
 * recorded already), else the last one recorded. Null means Back goes to the causes and plan.
 */
export function previousCheckId(results: readonly RecordedResult[], currentCheckId: string | null): string | null {
  const index = currentCheckId === null ? -1 : results.findIndex((entry) => entry.checkId === currentCheckId);
  if (index === 0) return null;
  if (index > 0) return results[index - 1].checkId;
  return results.at(-1)?.checkId ?? null;
}

/**
 * Records a result. A check recorded again replaces its earlier result and moves to the end of
 * the order, as the case timeline on the server does.
 */
export function withResult(results: readonly RecordedResult[], entry: RecordedResult): RecordedResult[] {
  return [...results.filter((r) => r.checkId !== entry.checkId), entry];
}

export function resultsMap(results: readonly RecordedResult[]): Record<string, CheckResultValue> {
  return Object.fromEntries(results.map((r) => [r.checkId, r.result]));
}

export function topCauses(rank: RankResponse | null): CauseProbability[] {
  return rank ? rank.causes.map((cause) => ({ id: cause.id, probability: cause.probability })) : [];
}

/** Reads an error thrown by an actor (an ApiError or anything else) into plain data. */
export function toWalkThroughError(error: unknown): WalkThroughError {
  if (error && typeof error === 'object') {
    const e = error as { status?: unknown; message?: unknown; fields?: unknown };
    const status = typeof e.status === 'number' ? e.status : 0;
    const message = typeof e.message === 'string' && e.message !== '' ? e.message : 'The request failed.';
    const fields: Record<string, string[]> = {};
    if (e.fields && typeof e.fields === 'object') {
      for (const [name, messages] of Object.entries(e.fields as Record<string, unknown>)) {
        if (Array.isArray(messages)) fields[name] = messages.map(String);
      }
    }
    return { status, message, fields };
  }
  return { status: 0, message: String(error), fields: {} };
}

/** The case's facts as the walk-through keeps them. */
export function fromCase(dto: CaseDto) {
  const { carburettorKind, ...values } = dto.setup;
  return {
    caseId: dto.id,
    kartId: dto.kartId,
    kartName: dto.kartName,
    symptoms: dto.symptoms,
    carburettorKind: (carburettorKind ?? null) as CarburettorKind | null,
    setupDraft: draftFromSetup(values),
    caseConditions: dto.conditions ?? {},
    rank: dto.rank,
    results: dto.results.map((r) => ({ checkId: r.checkId, result: r.result, note: r.note })),
    resolution: dto.resolution ? { causeId: dto.resolution.causeId, fix: dto.resolution.fix, note: dto.resolution.note } : null,
    stop: dto.stop,
    caseState: dto.state,
    rulesetVersion: dto.rulesetVersion,
  };
}
