import { SOMETHING_ELSE_ID, type LogOutcomeRequest, type OutcomeDto } from '@fuelwright/shared';

/** What the outcome form holds while it is filled in (text fields as typed). */
export interface OutcomeDraft {
  causes: string[];
  otherNote: string;
  fix: string;
  parts: string;
  labourMinutes: string;
  /** Still fixed after the next session: yes, no, or not known yet. */
  stillFixed: 'yes' | 'no' | 'unknown';
}

export type OutcomeTarget = { caseId: string } | { workOrderId: string };

export const EMPTY_DRAFT: OutcomeDraft = { causes: [], otherNote: '', fix: '', parts: '', labourMinutes: '', stillFixed: 'unknown' };

/** A draft filled from an entry, to correct it. */
export function draftFromOutcome(o: OutcomeDto): OutcomeDraft {
  return {
    causes: [...o.confirmedCauses],
    otherNote: o.otherNote,
    fix: o.fix,
    parts: o.parts,
    labourMinutes: o.labourMinutes === null ? '' : String(o.labourMinutes),
    stillFixed: o.stillFixed === null ? 'unknown' : o.stillFixed ? 'yes' : 'no',
  };
}

export const MAX_CAUSES = 5;
export const MAX_LABOUR_MINUTES = 6000;

/** Checks the browser can make before sending, keyed like the server's `fields`. */
export function validateDraft(d: OutcomeDraft): Record<string, string> {
  const errors: Record<string, string> = {};
  if (d.causes.length === 0) errors.confirmedCauses = 'Pick what was really wrong (or “Something else”).';
  else if (d.causes.length > MAX_CAUSES) errors.confirmedCauses = `Pick at most ${MAX_CAUSES} causes.`;
  if (d.causes.includes(SOMETHING_ELSE_ID) && !d.otherNote.trim()) errors.otherNote = 'Say what it was.';
  if (!d.fix.trim()) errors.fix = 'Say what fixed it.';
  const minutes = d.labourMinutes.trim();
  if (minutes !== '') {
    const n = Number(minutes);
    if (!Number.isInteger(n) || n < 0 || n > MAX_LABOUR_MINUTES) errors.labourMinutes = `Whole minutes from 0 to ${MAX_LABOUR_MINUTES}.`;
  }
  return errors;
}

/** The request for a checked draft. */
export function draftToRequest(d: OutcomeDraft, target: OutcomeTarget, supersedesId?: string): LogOutcomeRequest {
  const request: LogOutcomeRequest = { ...target, confirmedCauses: [...d.causes], fix: d.fix.trim() };
  if (d.causes.includes(SOMETHING_ELSE_ID)) request.otherNote = d.otherNote.trim();
  if (d.parts.trim()) request.parts = d.parts.trim();
  if (d.labourMinutes.trim() !== '') request.labourMinutes = Number(d.labourMinutes.trim());
  if (d.stillFixed !== 'unknown') request.stillFixed = d.stillFixed === 'yes';
  if (supersedesId) request.supersedesId = supersedesId;
  return request;
}

/**
 * The entries of one case or work order as a history: each current entry with the entries it
 * corrected (newest first). `outcomes` may come in any order.
 */
export function correctionChains<T extends OutcomeDto>(outcomes: readonly T[]): { current: T; corrected: T[] }[] {
  const byId = new Map(outcomes.map((o) => [o.id, o]));
  const heads = outcomes.filter((o) => o.current).sort((a, b) => b.at.localeCompare(a.at));
  return heads.map((head) => {
    const corrected: T[] = [];
    const seen = new Set([head.id]);
    for (let prev = head.supersedesId ? byId.get(head.supersedesId) : undefined; prev && !seen.has(prev.id); prev = prev.supersedesId ? byId.get(prev.supersedesId) : undefined) {
      seen.add(prev.id);
      corrected.push(prev);
    }
    return { current: head, corrected };
  });
}
