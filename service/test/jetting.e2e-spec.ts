import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { jettingSessions, karts } from '@fuelwright/db';
import { computeAir } from '@fuelwright/shared';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;
interface Session {
  id: string;
  sessionOn: string;
  ran: string;
  mainJet: number;
  densityKgM3: number;
  dryAirDensityKgM3: number;
  stationPressureHpa: number;
  temperatureC: number;
  relativeHumidityPct: number;
}

const GOOD = {
  sessionOn: '2026-11-29',
  track: '  Club circuit  ',
  temperatureC: 14,
  stationPressureHpa: 1009,
  relativeHumidityPct: 62,
  mainJet: 185,
  pilotJet: 37.5,
  needleClipGroove: 3,
  airScrewTurnsOut: 1.5,
  plugColour: 'tan',
  ran: 'right',
  lapTimeMs: 54321,
  note: 'Clean pull',
};

async function kartIdOf(agent: Agent, name: string): Promise<string> {
  const k = (await agent.get('/api/karts')).body.karts.find((x: { name: string }) => x.name === name);
  if (!k) throw new Error(`no kart ${name}`);
  return k.id;
}

async function newKart(agent: Agent, name: string): Promise<string> {
  const res = await agent.post('/api/karts').send({ name, displacementCc: 125, drive: 'gearbox', carburettorKind: 'pump-around' });
  expect(res.status).toBe(201);
  return res.body.id;
}

describe('jetting log over HTTP', () => {
  let t: TestApp;
  let racer: Agent;
  let racer2: Agent;
  let blue: string;
  let practice: string;
  const count = async () => (await t.db.db.select().from(jettingSessions)).length;

  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    racer2 = await signedIn(t, demoUser('racer2'));
    blue = await kartIdOf(racer, 'Blue 27');
    practice = await kartIdOf(racer, 'Practice chassis');
  });
  afterAll(() => t.close());

  it('lists a kart’s sessions newest first, each with the densities of its air', async () => {
    const res = await racer.get(`/api/karts/${blue}/sessions`);
    expect(res.status).toBe(200);
    const list: Session[] = res.body.sessions;
    expect(list.length).toBeGreaterThanOrEqual(2);
    expect(list.map((s) => s.sessionOn)).toEqual([...list.map((s) => s.sessionOn)].sort().reverse());
    for (const s of list) {
      // CIPM-2007 moist-air density (Picard et al., Metrologia 45 (2008) 149), as computeAir implements it
      // (checked against the paper's equations in shared/src/air/cipm2007.spec.ts).
      const air = computeAir({ temperatureC: s.temperatureC, stationPressureHpa: s.stationPressureHpa, relativeHumidityPct: s.relativeHumidityPct });
      expect(s.densityKgM3).toBeCloseTo(air.densityKgM3, 12);
      expect(s.dryAirDensityKgM3).toBeCloseTo(air.dryAirDensityKgM3, 12);
    }
  });

  it('logs a session, computing and storing density and dry-air density from the air entered', async () => {
    const kart = await newKart(racer, 'Log test');
    const res = await racer.post(`/api/karts/${kart}/sessions`).send(GOOD);
    expect(res.status).toBe(201);
    const air = computeAir({ temperatureC: 14, stationPressureHpa: 1009, relativeHumidityPct: 62 });
    expect(res.body).toMatchObject({
      kartId: kart,
      sessionOn: '2026-11-29',
      track: 'Club circuit',
      mainJet: 185,
      pilotJet: 37.5,
      plugColour: 'tan',
      ran: 'right',
      lapTimeMs: 54321,
      setupId: null,
      densityKgM3: air.densityKgM3,
      dryAirDensityKgM3: air.dryAirDensityKgM3,
    });
    // Physics: at 14 C and 1009 hPa air is about 1.22 kg/m3 (ideal gas, p/(R T) = 100900/(287.05 x 287.15) = 1.224; humidity lowers it a little).
    expect(res.body.densityKgM3).toBeGreaterThan(1.21);
    expect(res.body.densityKgM3).toBeLessThan(1.225);
    const [row] = await t.db.db.select().from(jettingSessions).where(eq(jettingSessions.id, res.body.id));
    expect(row.densityKgM3).toBe(air.densityKgM3);
    expect(row.dryAirDensityKgM3).toBe(air.dryAirDensityKgM3);

    // Elevation and sea-level pressure instead of the station pressure: the station pressure is derived and stored.
    const byAltitude = await racer
      .post(`/api/karts/${kart}/sessions`)
      .send({ ...GOOD, stationPressureHpa: undefined, altitudeM: 450, seaLevelPressureHpa: 1020, ran: 'rich', lapTimeMs: undefined });
    expect(byAltitude.status).toBe(201);
    // About 12 hPa per 100 m near sea level (ISA, ICAO Doc 7488): 450 m is roughly 53 hPa below the sea-level pressure.
    expect(1020 - byAltitude.body.stationPressureHpa).toBeGreaterThan(50);
    expect(1020 - byAltitude.body.stationPressureHpa).toBeLessThan(56);
    expect(byAltitude.body.lapTimeMs).toBeNull();
    const list = (await racer.get(`/api/karts/${kart}/sessions`)).body.sessions;
    expect(list).toHaveLength(2);
  });

  it('links a setup snapshot of the same kart and refuses another kart’s', async () => {
    const setupId = (await racer.get(`/api/karts/${blue}/setups`)).body.setups[0].id;
    const ok = await racer.post(`/api/karts/${blue}/sessions`).send({ ...GOOD, setupId, ran: 'rich' });
    expect(ok.status).toBe(201);
    expect(ok.body.setupId).toBe(setupId);
    const before = await count();
    const wrong = await racer.post(`/api/karts/${practice}/sessions`).send({ ...GOOD, setupId });
    expect(wrong.status).toBe(400);
    expect(Object.keys(wrong.body.fields)).toEqual(['setupId']);
    expect(await count()).toBe(before);
    expect((await racer.delete(`/api/karts/${blue}/sessions/${ok.body.id}`)).status).toBe(204);
  });

  it('refuses bad input with a message per field in trade words, writing nothing', async () => {
    const before = await count();
    const res = await racer.post(`/api/karts/${blue}/sessions`).send({
      sessionOn: '2999-01-01',
      temperatureC: 85,
      stationPressureHpa: 300,
      relativeHumidityPct: 120,
      mainJet: 20,
      pilotJet: 95,
      needleClipGroove: 2.5,
      airScrewTurnsOut: 9,
      plugColour: 'pink',
      ran: 'ok',
      lapTimeMs: 5.5,
      track: 42,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(
      [
        'airScrewTurnsOut',
        'lapTimeMs',
        'mainJet',
        'needleClipGroove',
        'pilotJet',
        'plugColour',
        'ran',
        'relativeHumidityPct',
        'sessionOn',
        'stationPressureHpa',
        'temperatureC',
        'track',
      ].sort(),
    );
    expect(res.body.fields.sessionOn[0]).toMatch(/not in the future/);
    expect(res.body.fields.temperatureC[0]).toMatch(/from -40 to 60 °C: the air temperature in the shade/);
    expect(res.body.fields.stationPressureHpa[0]).toMatch(/barometer/);
    expect(res.body.fields.mainJet[0]).toMatch(/from 50 to 400: the size stamped on the main jet/);
    expect(res.body.fields.ran[0]).toMatch(/rich .*right .*lean/);
    expect(res.body.fields.plugColour[0]).toMatch(/insulator/);
    expect(res.body.fields.lapTimeMs.join(' ')).toMatch(/milliseconds/);

    const noPressure = await racer.post(`/api/karts/${blue}/sessions`).send({ ...GOOD, stationPressureHpa: undefined });
    expect(noPressure.status).toBe(400);
    expect(Object.keys(noPressure.body.fields)).toEqual(['stationPressureHpa']);
    expect(noPressure.body.fields.stationPressureHpa[0]).toMatch(/elevation with the sea-level pressure/);
    const noQnh = await racer.post(`/api/karts/${blue}/sessions`).send({ ...GOOD, stationPressureHpa: undefined, altitudeM: 300 });
    expect(noQnh.status).toBe(400);
    expect(Object.keys(noQnh.body.fields)).toEqual(['seaLevelPressureHpa']);
    const missing = await racer.post(`/api/karts/${blue}/sessions`).send({ sessionOn: '2026-11-29' });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.fields).sort()).toEqual(['mainJet', 'ran', 'relativeHumidityPct', 'stationPressureHpa', 'temperatureC']);
    expect(await count()).toBe(before);
  });

  it('deletes a session; an unknown id or another kart’s session is 404', async () => {
    const kart = await newKart(racer, 'Delete test');
    const s = (await racer.post(`/api/karts/${kart}/sessions`).send(GOOD)).body;
    const blueSession = (await racer.get(`/api/karts/${blue}/sessions`)).body.sessions[0];
    expect((await racer.delete(`/api/karts/${kart}/sessions/${blueSession.id}`)).status).toBe(404);
    expect((await racer.delete(`/api/karts/${kart}/sessions/00000000-0000-4000-8000-000000000000`)).status).toBe(404);
    expect((await racer.delete(`/api/karts/${kart}/sessions/not-a-uuid`)).status).toBe(404);
    expect((await racer.delete(`/api/karts/${kart}/sessions/${s.id}`)).status).toBe(204);
    expect((await racer.get(`/api/karts/${kart}/sessions`)).body.sessions).toEqual([]);
    expect((await racer.get(`/api/karts/${blue}/sessions`)).body.sessions.map((x: Session) => x.id)).toContain(blueSession.id);
  });

  it('answers 404 for another racer’s kart on every route and changes nothing', async () => {
    const before = await count();
    const sessionId = (await racer.get(`/api/karts/${blue}/sessions`)).body.sessions[0].id;
    const [kitBefore] = await t.db.db.select({ jetKit: karts.jetKit }).from(karts).where(eq(karts.id, blue));
    const today = { temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50 };
    expect((await racer2.get(`/api/karts/${blue}/sessions`)).status).toBe(404);
    expect((await racer2.post(`/api/karts/${blue}/sessions`).send(GOOD)).status).toBe(404);
    expect((await racer2.delete(`/api/karts/${blue}/sessions/${sessionId}`)).status).toBe(404);
    expect((await racer2.get(`/api/karts/${blue}/jet-kit`)).status).toBe(404);
    expect((await racer2.put(`/api/karts/${blue}/jet-kit`).send({ scaling: 'flow', main: { step: 5 }, pilot: { step: 2.5 } })).status).toBe(404);
    expect((await racer2.post(`/api/karts/${blue}/jet-suggestion`).send(today)).status).toBe(404);
    for (const role of ['coach', 'shop', 'admin'] as const) {
      const agent = await signedIn(t, demoUser(role));
      expect((await agent.get(`/api/karts/${blue}/sessions`)).status).toBe(404);
    }
    expect(await count()).toBe(before);
    const [kitAfter] = await t.db.db.select({ jetKit: karts.jetKit }).from(karts).where(eq(karts.id, blue));
    expect(kitAfter).toEqual(kitBefore);
    expect((await racer.get(`/api/karts/${blue}/sessions`)).body.sessions.map((x: Session) => x.id)).toContain(sessionId);
  });

  it('needs a session', async () => {
    expect((await t.http.get(`/api/karts/${blue}/sessions`)).status).toBe(401);
    expect((await t.http.post(`/api/karts/${blue}/jet-suggestion`).send({})).status).toBe(401);
  });
});

describe('jet kit over HTTP', () => {
  let t: TestApp;
  let racer: Agent;
  let kart: string;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    kart = await newKart(racer, 'Kit test');
  });
  afterAll(() => t.close());

  it('shows the default kit until one is saved, then the saved one', async () => {
    const first = await racer.get(`/api/karts/${kart}/jet-kit`);
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ saved: false, jetKit: { scaling: 'diameter', main: { step: 2.5 }, pilot: { step: 2.5 } } });
    const put = await racer.put(`/api/karts/${kart}/jet-kit`).send({ scaling: 'flow', main: { step: 5 }, pilot: { sizes: [40, 35, 37.5, 35] } });
    expect(put.status).toBe(200);
    expect(put.body).toEqual({ saved: true, jetKit: { scaling: 'flow', main: { step: 5 }, pilot: { sizes: [35, 37.5, 40] } } });
    expect((await racer.get(`/api/karts/${kart}/jet-kit`)).body).toEqual(put.body);
  });

  it('refuses a bad kit field by field and keeps the saved one', async () => {
    const saved = (await racer.get(`/api/karts/${kart}/jet-kit`)).body;
    const res = await racer.put(`/api/karts/${kart}/jet-kit`).send({ scaling: 'size', main: { step: 2.5, sizes: [180] }, pilot: { sizes: [5, 'x'] } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['main.sizes', 'pilot.sizes', 'scaling']);
    expect(res.body.fields.scaling[0]).toMatch(/diameter .*flow/);
    expect(res.body.fields['main.sizes'].join(' ')).toMatch(/either step or sizes/);
    expect(res.body.fields['pilot.sizes'].join(' ')).toMatch(/from 10 to 80/);
    const empty = await racer.put(`/api/karts/${kart}/jet-kit`).send({ scaling: 'diameter', main: {}, pilot: { step: 0 } });
    expect(empty.status).toBe(400);
    expect(Object.keys(empty.body.fields).sort()).toEqual(['main.step', 'pilot.step']);
    const missing = await racer.put(`/api/karts/${kart}/jet-kit`).send({ scaling: 'diameter' });
    expect(Object.keys(missing.body.fields).sort()).toEqual(['main', 'pilot']);
    expect((await racer.get(`/api/karts/${kart}/jet-kit`)).body).toEqual(saved);
  });
});

describe('jet suggestion over HTTP', () => {
  let t: TestApp;
  let racer: Agent;
  let blue: string;
  let practice: string;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    blue = await kartIdOf(racer, 'Blue 27');
    practice = await kartIdOf(racer, 'Practice chassis');
  });
  afterAll(() => t.close());

  /** Density that sets the metering when humidity counts: rho_d^2 / rho (shared/src/jetting, from Heywood ch. 7). */
  const metering = (a: { densityKgM3: number; dryAirDensityKgM3: number }) => a.dryAirDensityKgM3 ** 2 / a.densityKgM3;

  it('starts from the newest session that ran right, with all sessions that ran right as the logged range', async () => {
    const sessions: Session[] = (await racer.get(`/api/karts/${blue}/sessions`)).body.sessions;
    const right = sessions.filter((s) => s.ran === 'right');
    expect(right.length).toBeGreaterThanOrEqual(2);
    const newestRight = right[0];
    const res = await racer.post(`/api/karts/${blue}/jet-suggestion`).send({ temperatureC: 3, stationPressureHpa: 1025, relativeHumidityPct: 70 });
    expect(res.status).toBe(200);
    expect(res.body.baseline.id).toBe(newestRight.id);
    expect(res.body.rightSessions.map((s: Session) => s.id).sort()).toEqual(right.map((s) => s.id).sort());
    expect(res.body.jetKit).toEqual({ scaling: 'diameter', main: { step: 2.5 }, pilot: { step: 2.5 } });
    const { suggestion, air } = res.body;
    expect(air.densityKgM3).toBe(computeAir({ temperatureC: 3, stationPressureHpa: 1025, relativeHumidityPct: 70 }).densityKgM3);
    // Jet law (Heywood, Internal Combustion Engine Fundamentals, 1988, ch. 7): holding the mixture needs a jet
    // flow area proportional to the square root of the (metering) air density; with diameter-numbered jets the
    // number goes as the fourth root.
    const ratio = metering(air) / metering(newestRight);
    expect(suggestion.main.baseline).toBe(newestRight.mainJet);
    expect(suggestion.main.unrounded).toBeCloseTo(newestRight.mainJet * ratio ** 0.25, 9);
    // Denser air leans a fixed jet, so a cold, high-pressure day needs a bigger (richer) main jet (same source).
    expect(air.densityKgM3).toBeGreaterThan(newestRight.densityKgM3);
    expect(suggestion.main.change).toBe('richer');
    expect(suggestion.main.suggested).toBeGreaterThan(newestRight.mainJet);
    // Kit of steps of 2.5 from the baseline: the suggestion is a size held.
    expect(((suggestion.main.suggested - newestRight.mainJet) / 2.5) % 1).toBe(0);
    expect(suggestion.reasoning.length).toBeGreaterThan(3);
    expect(suggestion.cautions[0].code).toBe('fuel-handling');
    expect(['high', 'medium', 'low']).toContain(suggestion.confidence);
    expect(suggestion.loggedRange.days).toBe(right.length);
  });

  it('starts from a chosen session that ran right, and refuses one that did not', async () => {
    const sessions: Session[] = (await racer.get(`/api/karts/${blue}/sessions`)).body.sessions;
    const oldestRight = sessions.filter((s) => s.ran === 'right').at(-1)!;
    const notRight = sessions.find((s) => s.ran !== 'right')!;
    const today = { temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50 };
    const chosen = await racer.post(`/api/karts/${blue}/jet-suggestion`).send({ ...today, baselineSessionId: oldestRight.id });
    expect(chosen.status).toBe(200);
    expect(chosen.body.baseline.id).toBe(oldestRight.id);
    expect(chosen.body.suggestion.main.baseline).toBe(oldestRight.mainJet);
    const refused = await racer.post(`/api/karts/${blue}/jet-suggestion`).send({ ...today, baselineSessionId: notRight.id });
    expect(refused.status).toBe(400);
    expect(Object.keys(refused.body.fields)).toEqual(['baselineSessionId']);
  });

  it('rounds to the sizes the kit holds and shows the unrounded value', async () => {
    const kart = await newKart(racer, 'Sizes test');
    await racer.post(`/api/karts/${kart}/sessions`).send({ ...GOOD, mainJet: 185, ran: 'right' });
    expect((await racer.put(`/api/karts/${kart}/jet-kit`).send({ scaling: 'flow', main: { sizes: [170, 180, 190] }, pilot: { step: 2.5 } })).status).toBe(200);
    const res = await racer.post(`/api/karts/${kart}/jet-suggestion`).send({ temperatureC: 30, stationPressureHpa: 990, relativeHumidityPct: 60 });
    expect(res.status).toBe(200);
    const { main } = res.body.suggestion;
    // Flow-numbered jets scale with the square root of the metering-density ratio (Heywood ch. 7, as above).
    const base = res.body.baseline;
    expect(main.unrounded).toBeCloseTo(185 * Math.sqrt(metering(res.body.air) / metering(base)), 9);
    expect([170, 180, 185, 190]).toContain(main.suggested);
    const nearest = [170, 180, 185, 190].reduce((a, b) => (Math.abs(b - main.unrounded) < Math.abs(a - main.unrounded) ? b : a));
    expect(main.suggested).toBe(nearest);
  });

  it('cautions about lean seizure when today asks for more than one main size leaner', async () => {
    const kart = await newKart(racer, 'Lean test');
    await racer.post(`/api/karts/${kart}/sessions`).send({ ...GOOD, temperatureC: 5, stationPressureHpa: 1030, relativeHumidityPct: 40, ran: 'right' });
    const res = await racer.post(`/api/karts/${kart}/jet-suggestion`).send({ temperatureC: 38, stationPressureHpa: 960, relativeHumidityPct: 70 });
    expect(res.status).toBe(200);
    const { suggestion } = res.body;
    expect(suggestion.main.steps).toBeLessThan(-1);
    const lean = suggestion.cautions.find((c: { code: string }) => c.code === 'lean-seizure');
    expect(lean).toBeDefined();
    expect(lean.text).toMatch(/seize/);
  });

  it('answers 409 with a clear message while no session ran right', async () => {
    const res = await racer.post(`/api/karts/${practice}/jet-suggestion`).send({ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50 });
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/No session of this kart has run right yet/);
    const fresh = await newKart(racer, 'Empty log');
    expect((await racer.post(`/api/karts/${fresh}/jet-suggestion`).send({ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50 })).status).toBe(409);
  });

  it('refuses bad air for today field by field', async () => {
    const res = await racer.post(`/api/karts/${blue}/jet-suggestion`).send({ temperatureC: 'hot', relativeHumidityPct: -3, baselineSessionId: 'first' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['baselineSessionId', 'relativeHumidityPct', 'stationPressureHpa', 'temperatureC']);
  });
});
