import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { jettingSessions, karts, openDatabase, users, type DatabaseHandle } from '@fuelwright/db';
import { AirDensityBaseline } from './air-density-baseline.js';

describe('AirDensityBaseline', { timeout: 30_000 }, () => {
  let handle: DatabaseHandle;
  let baseline: AirDensityBaseline;
  let kartId: string;
  let emptyKartId: string;

  const session = (sessionOn: string, ran: 'rich' | 'right' | 'lean', densityKgM3: number, createdAt?: Date) => ({
    kartId,
    sessionOn,
    ran,
    densityKgM3,
    dryAirDensityKgM3: densityKgM3 - 0.01,
    temperatureC: 15,
    stationPressureHpa: 1000,
    relativeHumidityPct: 50,
    mainJet: 185,
    ...(createdAt ? { createdAt } : {}),
  });

  beforeAll(async () => {
    handle = await openDatabase({ memory: true });
    await handle.migrate();
    const [owner] = await handle.db.insert(users).values({ email: 'a@example.test', displayName: 'A', passwordHash: 'x' }).returning();
    const kart = { ownerId: owner.id, displacementCc: 125, drive: 'gearbox' as const, carburettorKind: 'pump-around' as const };
    [{ id: kartId }, { id: emptyKartId }] = await handle.db
      .insert(karts)
      .values([
        { ...kart, name: 'With log' },
        { ...kart, name: 'No log' },
      ])
      .returning({ id: karts.id });
    baseline = new AirDensityBaseline(handle.db);
  }, 120_000); // a fresh in-memory PGlite with the migrations: several seconds, more on a busy machine
  afterAll(() => handle.close());

  it('is null while no session of the kart ran right', async () => {
    expect(await baseline.densityChangeSince(emptyKartId, 1.2)).toBeNull();
    await handle.db.insert(jettingSessions).values([session('2026-10-01', 'rich', 1.2), session('2026-10-02', 'lean', 1.21)].map((s) => ({ ...s, kartId: emptyKartId })));
    expect(await baseline.densityChangeSince(emptyKartId, 1.2)).toBeNull();
    expect(await baseline.baselineOf(emptyKartId)).toBeNull();
  });

  it('measures the change from the newest session that ran right, ignoring newer sessions that did not', async () => {
    await handle.db.insert(jettingSessions).values([
      session('2026-09-01', 'right', 1.25),
      session('2026-10-15', 'right', 1.2),
      session('2026-11-01', 'lean', 1.28),
    ]);
    const day = await baseline.baselineOf(kartId);
    expect(day).toMatchObject({ sessionOn: '2026-10-15', densityKgM3: 1.2 });
    // Definition of the fact air-density-changed: 100 (today - baseline) / baseline, positive = denser today
    // (shared/src/air/README.md); denser air leans a fixed jet (Heywood, Internal Combustion Engine Fundamentals, ch. 7).
    expect(await baseline.densityChangeSince(kartId, 1.23)).toBeCloseTo(2.5, 10);
    expect(await baseline.densityChangeSince(kartId, 1.14)).toBeCloseTo(-5, 10);
    expect(await baseline.densityChangeSince(kartId, 1.2)).toBe(0);
  });

  it('takes the later of two sessions that ran right on the same day', async () => {
    await handle.db.insert(jettingSessions).values([
      session('2026-11-20', 'right', 1.1, new Date('2026-11-20T15:00:00Z')),
      session('2026-11-20', 'right', 1.0, new Date('2026-11-20T09:00:00Z')),
    ]);
    expect((await baseline.baselineOf(kartId))?.densityKgM3).toBe(1.1);
    expect(await baseline.densityChangeSince(kartId, 1.21)).toBeCloseTo(10, 10);
  });
});
