import { readFileSync } from 'node:fs';
import { sql } from 'drizzle-orm';
import { computeAir, type JettingSessionInput, type Role, type SetupInput } from '@fuelwright/shared';
import type { Db } from './client.js';
import { jettingSessions, karts, setups, users } from './schema/index.js';

export const DEMO_FIXTURE_PATH = new URL('../../fixtures/demo-club.json', import.meta.url);

export interface DemoFixture {
  club: { name: string };
  password: string;
  users: { email: string; displayName: string; role: Role }[];
  karts: {
    owner: string;
    name: string;
    displacementCc: number;
    drive: 'gearbox' | 'direct-drive';
    carburettorKind: 'pump-around' | 'float-valve';
    notes: string;
  }[];
  /** Setup snapshots, by kart name. */
  setups?: (SetupInput & { kart: string })[];
  /** Jetting log sessions, by kart name; the densities are computed from the air when seeding. */
  jettingSessions?: (JettingSessionInput & { kart: string; stationPressureHpa: number })[];
}

export function readDemoFixture(): DemoFixture {
  return JSON.parse(readFileSync(DEMO_FIXTURE_PATH, 'utf8')) as DemoFixture;
}

/**
 * Loads the invented demo club when the database has no users yet; otherwise does nothing.
 * Returns whether it seeded. One transaction: a half-seeded database is never left behind.
 */
export async function seedDemoIfEmpty(
  db: Db,
  hashPassword: (plain: string) => Promise<string>,
  fixture: DemoFixture = readDemoFixture(),
): Promise<boolean> {
  const [{ count }] = await db.select({ count: sql<number>`count(*)::int` }).from(users);
  if (count > 0) return false;
  const passwordHash = await hashPassword(fixture.password);
  await db.transaction(async (tx) => {
    const inserted = await tx
      .insert(users)
      .values(fixture.users.map((u) => ({ email: u.email, displayName: u.displayName, role: u.role, passwordHash, emailVerifiedAt: new Date() })))
      .returning({ id: users.id, email: users.email });
    const idByEmail = new Map(inserted.map((u) => [u.email, u.id]));
    if (fixture.karts.length === 0) return;
    const kartRows = await tx
      .insert(karts)
      .values(
        fixture.karts.map((k) => {
          const ownerId = idByEmail.get(k.owner);
          if (!ownerId) throw new Error(`demo fixture: kart "${k.name}" names unknown owner ${k.owner}`);
          return { ownerId, name: k.name, displacementCc: k.displacementCc, drive: k.drive, carburettorKind: k.carburettorKind, notes: k.notes };
        }),
      )
      .returning({ id: karts.id, name: karts.name, ownerId: karts.ownerId });
    const kartByName = new Map(kartRows.map((k) => [k.name, k]));
    const snapshots = fixture.setups ?? [];
    if (snapshots.length > 0) {
      await tx.insert(setups).values(
        snapshots.map(({ kart, note, ...values }) => {
          const k = kartByName.get(kart);
          if (!k) throw new Error(`demo fixture: setup names unknown kart "${kart}"`);
          return { ...values, note: note ?? '', kartId: k.id, createdBy: k.ownerId };
        }),
      );
    }
    const sessions = fixture.jettingSessions ?? [];
    if (sessions.length > 0) {
      await tx.insert(jettingSessions).values(
        sessions.map(({ kart, note, track, altitudeM: _a, seaLevelPressureHpa: _q, ...s }) => {
          const k = kartByName.get(kart);
          if (!k) throw new Error(`demo fixture: jetting session names unknown kart "${kart}"`);
          const air = computeAir({ temperatureC: s.temperatureC, stationPressureHpa: s.stationPressureHpa, relativeHumidityPct: s.relativeHumidityPct });
          return { ...s, track: track ?? '', note: note ?? '', densityKgM3: air.densityKgM3, dryAirDensityKgM3: air.dryAirDensityKgM3, kartId: k.id, createdBy: k.ownerId };
        }),
      );
    }
  });
  return true;
}
