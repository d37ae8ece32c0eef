import { formatDensity, ISA_SEA_LEVEL_DENSITY, type JettingSessionDto } from '@fuelwright/shared';

/**
 * What the relative air density is measured against: ISA sea level, one of the racer's logged
 * sessions (its stored CIPM-2007 density), or a density typed by hand. The choice is kept in this
 * browser, so the page opens with the reference the racer used last.
 */
export type ReferenceChoice =
  | { kind: 'isa-sea-level' }
  | { kind: 'session'; sessionId: string | null }
  | { kind: 'typed'; densityText: string };

export type ReferenceKind = ReferenceChoice['kind'];

/** A logged session with the name of its kart. */
export type ReferenceSession = JettingSessionDto & { kartName: string };

export const REFERENCE_STORAGE_KEY = 'fuelwright.conditions.reference';

export function loadReferenceChoice(): ReferenceChoice {
  let parsed: unknown = null;
  try {
    const raw = window.localStorage.getItem(REFERENCE_STORAGE_KEY);
    parsed = raw ? JSON.parse(raw) : null;
  } catch {
    parsed = null; // storage blocked or garbled: start from ISA sea level
  }
  const p = (parsed ?? {}) as Record<string, unknown>;
  if (p.kind === 'session') return { kind: 'session', sessionId: typeof p.sessionId === 'string' ? p.sessionId : null };
  if (p.kind === 'typed') return { kind: 'typed', densityText: typeof p.densityText === 'string' ? p.densityText : '' };
  return { kind: 'isa-sea-level' };
}

export function storeReferenceChoice(choice: ReferenceChoice): void {
  try {
    window.localStorage.setItem(REFERENCE_STORAGE_KEY, JSON.stringify(choice));
  } catch {
    // not remembered, but used for this visit
  }
}

/** Ran-right sessions first (they are the days to jet from), each group newest first. */
export function sortReferenceSessions(sessions: ReferenceSession[]): ReferenceSession[] {
  const newestFirst = (a: ReferenceSession, b: ReferenceSession) =>
    b.sessionOn.localeCompare(a.sessionOn) || b.createdAt.localeCompare(a.createdAt);
  return [...sessions.filter((s) => s.ran === 'right').sort(newestFirst), ...sessions.filter((s) => s.ran !== 'right').sort(newestFirst)];
}

/** A calendar day (YYYY-MM-DD) as the browser's locale writes it, e.g. "12 Nov 2026". */
export function formatSessionDay(isoDay: string): string {
  const date = new Date(`${isoDay}T12:00:00`);
  return Number.isNaN(date.getTime()) ? isoDay : date.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

/**
 * One line of the session select: kart, day, density, how it ran, track (the track last, since a
 * phone-width select cuts the end off; the line under the select repeats it whole).
 */
export function sessionOptionText(s: ReferenceSession): string {
  return [s.kartName, formatSessionDay(s.sessionOn), formatDensity(s.densityKgM3), `ran ${s.ran}`, s.track || 'no track given'].join(' · ');
}

/** The picked session whole, under the select: "Blue 27, 12 Nov 2026 at Club circuit: ran right, 1.172 kg/m³". */
export function sessionDetailText(s: ReferenceSession): string {
  const track = s.track ? ` at ${s.track}` : '';
  return `${s.kartName}, ${formatSessionDay(s.sessionOn)}${track}: ran ${s.ran}, ${formatDensity(s.densityKgM3)}`;
}

/** What the figures were measured against, in words, e.g. "Blue 27’s session of 12 Nov 2026 (ran right), 1.172 kg/m³". */
export function sessionReferenceText(s: ReferenceSession): string {
  return `${s.kartName}’s session of ${formatSessionDay(s.sessionOn)} (ran ${s.ran}), ${formatDensity(s.densityKgM3)}`;
}

export const ISA_REFERENCE_TEXT = `ISA sea level, ${formatDensity(ISA_SEA_LEVEL_DENSITY)}`;

export function typedReferenceText(densityKgM3: number): string {
  return `the density you typed, ${formatDensity(densityKgM3)}`;
}
