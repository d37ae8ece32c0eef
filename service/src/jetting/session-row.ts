import { and, asc, desc, eq } from 'drizzle-orm';
import { jettingSessions, karts, type Db, type JettingSessionRow } from '@fuelwright/db';
import { DEFAULT_JET_KIT, type JetKit, type JettingSessionDto } from '@fuelwright/shared';

export function toSessionDto(r: JettingSessionRow): JettingSessionDto {
  return {
    id: r.id,
    kartId: r.kartId,
    sessionOn: r.sessionOn,
    track: r.track,
    temperatureC: r.temperatureC,
    stationPressureHpa: r.stationPressureHpa,
    relativeHumidityPct: r.relativeHumidityPct,
    densityKgM3: r.densityKgM3,
    dryAirDensityKgM3: r.dryAirDensityKgM3,
    setupId: r.setupId,
    mainJet: r.mainJet,
    pilotJet: r.pilotJet,
    needleClipGroove: r.needleClipGroove,
    airScrewTurnsOut: r.airScrewTurnsOut,
    plugColour: r.plugColour,
    ran: r.ran,
    lapTimeMs: r.lapTimeMs,
    note: r.note,
    createdAt: r.createdAt.toISOString(),
  };
}

/** Every session of a kart, newest first (by day, then by when it was logged). */
export function listSessionRows(db: Db, kartId: string) {
  return db
    .select()
    .from(jettingSessions)
    .where(eq(jettingSessions.kartId, kartId))
    .orderBy(desc(jettingSessions.sessionOn), desc(jettingSessions.createdAt));
}

/** The sessions of a kart that ran right, oldest first. */
export function listRightSessionRows(db: Db, kartId: string) {
  return db
    .select()
    .from(jettingSessions)
    .where(and(eq(jettingSessions.kartId, kartId), eq(jettingSessions.ran, 'right')))
    .orderBy(asc(jettingSessions.sessionOn), asc(jettingSessions.createdAt));
}

/** The newest session of a kart that ran right, if any. */
export async function newestRightSessionRow(db: Db, kartId: string): Promise<JettingSessionRow | undefined> {
  const [row] = await db
    .select()
    .from(jettingSessions)
    .where(and(eq(jettingSessions.kartId, kartId), eq(jettingSessions.ran, 'right')))
    .orderBy(desc(jettingSessions.sessionOn), desc(jettingSessions.createdAt))
    .limit(1);
  return row;
}

function isSizeSet(v: unknown): v is JetKit['main'] {
  if (typeof v !== 'object' || v === null) return false;
  const o = v as Record<string, unknown>;
  if (typeof o.step === 'number') return o.step > 0;
  return Array.isArray(o.sizes) && o.sizes.length > 0 && o.sizes.every((s) => typeof s === 'number' && s > 0);
}

/** The stored jet kit of a kart, or null when none is saved (or what is stored is unusable). */
export function parseJetKit(stored: unknown): JetKit | null {
  if (typeof stored !== 'object' || stored === null) return null;
  const o = stored as Record<string, unknown>;
  if ((o.scaling !== 'diameter' && o.scaling !== 'flow') || !isSizeSet(o.main) || !isSizeSet(o.pilot)) return null;
  return { scaling: o.scaling, main: o.main, pilot: o.pilot };
}

export async function loadJetKit(db: Db, kartId: string): Promise<{ jetKit: JetKit; saved: boolean }> {
  const [row] = await db.select({ jetKit: karts.jetKit }).from(karts).where(eq(karts.id, kartId)).limit(1);
  const kit = parseJetKit(row?.jetKit);
  return kit ? { jetKit: kit, saved: true } : { jetKit: structuredClone(DEFAULT_JET_KIT) as JetKit, saved: false };
}
