/**
 * Where a walk-through is kept between visits: the machine's persisted snapshot in localStorage,
 * per case id, per racer for a case still being described, and one for a quick diagnosis.
 * Only snapshots at rest are stored (never one waiting for the server), stamped with a version
 * so that a snapshot of an older machine is dropped rather than restored into the wrong place.
 */
import type { Snapshot } from 'xstate';
import { emptyConditionsDraft } from '../machines/conditions-draft';
import type { WalkThroughContext } from '../machines/walk-through.machine';

/** Bump when the machine's states or context change shape. */
export const WALK_THROUGH_STORAGE_VERSION = 1;

const PREFIX = 'fuelwright.diagnosis';
export const QUICK_DIAGNOSIS_KEY = `${PREFIX}.quick`;
export const caseStorageKey = (caseId: string) => `${PREFIX}.case.${caseId}`;
export const newCaseStorageKey = (userId: string) => `${PREFIX}.new-case.${userId}`;

interface Stored {
  v: number;
  savedAt: string;
  snapshot: Snapshot<unknown> & { value: unknown; context: WalkThroughContext };
}

function storage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    return null;
  }
}

/** The stored snapshot under `key`, or null when there is none or it does not fit this machine. */
export function loadWalkThrough(key: string): Stored['snapshot'] | null {
  const raw = storage()?.getItem(key);
  if (!raw) return null;
  try {
    const stored = JSON.parse(raw) as Partial<Stored>;
    const snapshot = stored.snapshot;
    if (stored.v !== WALK_THROUGH_STORAGE_VERSION || !snapshot || snapshot.status !== 'active') return null;
    const context = snapshot.context as Partial<WalkThroughContext> | undefined;
    if (!context || (context.mode !== 'quick' && context.mode !== 'case') || !Array.isArray(context.results)) return null;
    // Stored before the intake took the day's air and fuel, or before an open case's facts could be
    // corrected: the same snapshot with nothing typed there (reconciling reads the case's conditions).
    if (!context.conditionsDraft || !context.caseConditions || context.correction === undefined) {
      return {
        ...snapshot,
        context: {
          ...(context as WalkThroughContext),
          conditionsDraft: context.conditionsDraft ?? emptyConditionsDraft(),
          caseConditions: context.caseConditions ?? {},
          correction: context.correction ?? null,
        },
      };
    }
    return snapshot;
  } catch {
    return null;
  }
}

export function saveWalkThrough(key: string, snapshot: Snapshot<unknown>): void {
  const stored: Stored = { v: WALK_THROUGH_STORAGE_VERSION, savedAt: new Date().toISOString(), snapshot: snapshot as Stored['snapshot'] };
  try {
    storage()?.setItem(key, JSON.stringify(stored));
  } catch {
    // Storage full or blocked: the walk-through still works, it just will not resume.
  }
}

export function clearWalkThrough(key: string): void {
  try {
    storage()?.removeItem(key);
  } catch {
    /* nothing to clear */
  }
}

/** The visitor's quick diagnosis as kept in this browser (for "Save this case"), or null. */
export function loadQuickDiagnosis(): WalkThroughContext | null {
  const snapshot = loadWalkThrough(QUICK_DIAGNOSIS_KEY);
  return snapshot && snapshot.context.mode === 'quick' ? snapshot.context : null;
}
