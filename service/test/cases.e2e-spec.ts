import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asc, eq } from 'drizzle-orm';
import { caseEvents, cases } from '@fuelwright/db';
import type { CaseDto } from '@fuelwright/shared';
import { replay, type CaseEvent } from '../src/cases/case-projection.js';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

describe('cases over HTTP', () => {
  let t: TestApp;
  let racer: Agent;
  let racer2: Agent;
  let kartId: string;
  let otherKartId: string;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    racer2 = await signedIn(t, demoUser('racer2'));
    kartId = (await racer.get('/api/karts')).body.karts.find((k: { name: string }) => k.name === 'Blue 27').id;
    otherKartId = (await racer2.get('/api/karts')).body.karts[0].id;
  });
  afterAll(() => t.close());

  const open = (agent: Agent, body: object) => agent.post('/api/cases').send(body);

  it('opens a case with the kart’s latest setup and the current ruleset, ranked', async () => {
    const res = await open(racer, { kartId, symptoms: [{ id: 'bog-on-acceleration', band: 'up-to-quarter' }, { id: 'sporadic-running' }] });
    expect(res.status).toBe(201);
    const c: CaseDto = res.body;
    expect(c.state).toBe('open');
    expect(c.kartName).toBe('Blue 27');
    const catalog = (await t.http.get('/api/catalog')).body;
    expect(c.rulesetVersion).toBe(catalog.version);
    // The newest demo snapshot of this kart (idle screw set, main jet 182.5) was taken over.
    expect(c.setup).toMatchObject({ carburettorKind: 'pump-around', mainJet: 182.5, idleScrew: 'set' });
    expect(c.rank.causes.length).toBeGreaterThan(3);
    expect(c.rank.plan.length).toBeGreaterThan(0);
    expect(c.topCauseId).toBe(c.rank.causes[0].id);
    expect(c.events.map((e) => e.type)).toEqual(['opened']);
    expect(c.events[0].actorName).toBe('Tamsin Vell');
  });

  it('records check results as appended events; each re-ranks, and going back to a check replaces its result', async () => {
    const c: CaseDto = (await open(racer, { kartId, symptoms: ['bog-on-acceleration', 'sporadic-running'] })).body;
    const first = c.rank.plan[0];
    const after1 = await racer.post(`/api/cases/${c.id}/results`).send({ checkId: first.checkId, result: 'looks-fine', note: 'clean' });
    expect(after1.status).toBe(200);
    expect(after1.body.results).toEqual([expect.objectContaining({ checkId: first.checkId, result: 'looks-fine', note: 'clean' })]);
    expect(after1.body.rank.plan.map((p: { checkId: string }) => p.checkId)).not.toContain(first.checkId);
    expect(after1.body.rank).not.toEqual(c.rank);
    const again = await racer.post(`/api/cases/${c.id}/results`).send({ checkId: first.checkId, result: 'not-checked' });
    expect(again.body.results).toHaveLength(1);
    expect(again.body.results[0].result).toBe('not-checked');
    expect(again.body.events.map((e: { type: string }) => e.type)).toEqual(['opened', 'check-recorded', 'check-recorded']);
    // The first opening ranking is kept as it was.
    expect(again.body.openingRank).toEqual(c.rank);
    const rows = await t.db.db.select().from(caseEvents);
    expect(rows.filter((r) => r.caseId === c.id).map((r) => r.seq)).toEqual([1, 2, 3]);
  });

  it('replaying the stored case_events rows of a case gives the stored cases.snapshot', async () => {
    const c: CaseDto = (await open(racer, { kartId, symptoms: ['bog-on-acceleration', 'sporadic-running'] })).body;
    const [a, b] = c.rank.plan;
    expect((await racer.post(`/api/cases/${c.id}/results`).send({ checkId: a.checkId, result: 'looks-fine', note: 'clean' })).status).toBe(200);
    expect((await racer.put(`/api/cases/${c.id}/symptoms`).send({ symptoms: [{ id: 'bog-on-acceleration', band: 'up-to-quarter' }] })).status).toBe(200);
    expect((await racer.post(`/api/cases/${c.id}/results`).send({ checkId: b.checkId, result: 'fault-found' })).status).toBe(200);
    expect((await racer.post(`/api/cases/${c.id}/results`).send({ checkId: a.checkId, result: 'not-checked' })).status).toBe(200);
    expect((await racer.post(`/api/cases/${c.id}/abandon`).send({ reason: 'Out of time' })).status).toBe(200);

    const rows = await t.db.db.select().from(caseEvents).where(eq(caseEvents.caseId, c.id)).orderBy(asc(caseEvents.seq));
    expect(rows.map((r) => r.type)).toEqual(['opened', 'check-recorded', 'symptoms-reported', 'check-recorded', 'check-recorded', 'abandoned']);
    const events = rows.map((r) => ({ type: r.type, payload: r.payload, at: r.at, actorId: r.actorId }) as CaseEvent);
    const [row] = await t.db.db.select().from(cases).where(eq(cases.id, c.id));
    const replayed = replay(events);
    expect(replayed).toEqual(row.snapshot);
    expect(replayed.state).toBe('abandoned');
    expect(replayed.results.map((r) => [r.checkId, r.result])).toEqual([[b.checkId, 'fault-found'], [a.checkId, 'not-checked']]);
    expect(row.revision).toBe(rows.length);
  });

  it('resolves a case with a catalog cause, then refuses further steps with 409', async () => {
    const c: CaseDto = (await open(racer, { kartId, symptoms: ['slow-deceleration'] })).body;
    const res = await racer.post(`/api/cases/${c.id}/resolve`).send({ causeId: 'idle-screw-set', fix: 'Backed the idle screw off' });
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('resolved');
    expect(res.body.resolution).toMatchObject({ causeId: 'idle-screw-set', fix: 'Backed the idle screw off' });
    const late = await racer.post(`/api/cases/${c.id}/results`).send({ checkId: c.rank.plan[0].checkId, result: 'looks-fine' });
    expect(late.status).toBe(409);
  });

  it('abandons a case', async () => {
    const c: CaseDto = (await open(racer, { kartId, symptoms: ['hesitation'] })).body;
    const res = await racer.post(`/api/cases/${c.id}/abandon`).send({ reason: 'Went away after the rain' });
    expect(res.body).toMatchObject({ state: 'abandoned', abandonedReason: 'Went away after the rain' });
  });

  it('changes the symptoms of an open case and re-ranks', async () => {
    const c: CaseDto = (await open(racer, { kartId, symptoms: ['hesitation'] })).body;
    const res = await racer.put(`/api/cases/${c.id}/symptoms`).send({ symptoms: [{ id: 'fuel-from-vents' }] });
    expect(res.status).toBe(200);
    expect(res.body.symptomIds).toEqual(['fuel-from-vents']);
    expect(res.body.events.at(-1).type).toBe('symptoms-reported');
  });

  it('refuses unknown symptom, check and cause ids with 400 naming them, writing nothing', async () => {
    const before = (await t.db.db.select().from(cases)).length;
    const bad = await open(racer, { kartId, symptoms: ['bog-on-acceleration', 'engine-sad'] });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.fields)).toMatch(/engine-sad/);
    const badResult = await open(racer, { kartId, symptoms: ['hesitation'], results: [{ checkId: 'no-such-check', result: 'looks-fine' }] });
    expect(badResult.status).toBe(400);
    expect(JSON.stringify(badResult.body.fields)).toMatch(/no-such-check/);
    expect((await t.db.db.select().from(cases)).length).toBe(before);
    const c: CaseDto = (await open(racer, { kartId, symptoms: ['hesitation'] })).body;
    const events = (await t.db.db.select().from(caseEvents)).length;
    expect((await racer.post(`/api/cases/${c.id}/results`).send({ checkId: 'no-such-check', result: 'looks-fine' })).status).toBe(400);
    expect((await racer.post(`/api/cases/${c.id}/results`).send({ checkId: c.rank.plan[0].checkId, result: 'maybe' })).body.fields.result).toBeDefined();
    expect((await racer.post(`/api/cases/${c.id}/resolve`).send({ causeId: 'gremlins', fix: 'x' })).body.fields.causeId[0]).toMatch(/gremlins/);
    expect((await t.db.db.select().from(caseEvents)).length).toBe(events);
  });

  it('turns today’s air into the density change since the last session that ran right', async () => {
    const sessions = (await racer.get(`/api/karts/${kartId}/sessions`)).body.sessions as { ran: string; densityKgM3: number; sessionOn: string }[];
    const baseline = sessions.filter((x) => x.ran === 'right').sort((a, b) => (a.sessionOn < b.sessionOn ? 1 : -1))[0];
    const withAir: CaseDto = (await open(racer, { kartId, symptoms: ['lean-top-end'], conditions: { today: { densityKgM3: baseline.densityKgM3 * 1.08 } } })).body;
    // Definition of the fact: 100 (today - baseline) / baseline (shared/src/air/README.md).
    expect(withAir.conditions.densityChangePct).toBeCloseTo(8, 6);
    expect(withAir.conditions.reference?.densityKgM3).toBeCloseTo(baseline.densityKgM3, 9);
    const without: CaseDto = (await open(racer, { kartId, symptoms: ['lean-top-end'] })).body;
    const p = (c: CaseDto) => c.rank.causes.find((x) => x.id === 'air-density-changed')?.probability ?? 0;
    // Denser air leans a fixed jet (Heywood, Internal Combustion Engine Fundamentals, ch. 7): the cause must gain.
    expect(p(withAir)).toBeGreaterThan(p(without));
  });

  it('opens a case on a kart with no setup snapshot', async () => {
    const kart = (await racer.post('/api/karts').send({ name: 'Bare', displacementCc: 100, drive: 'direct-drive', carburettorKind: 'float-valve' })).body;
    const res = await open(racer, { kartId: kart.id, symptoms: ['hard-cold-start'] });
    expect(res.status).toBe(201);
    expect(res.body.setup).toEqual({ carburettorKind: 'float-valve' });
  });

  it('saves a visitor’s quick diagnosis with the checks already done', async () => {
    const rank = (await t.http.post('/api/diagnosis/rank').send({ symptoms: ['bog-on-acceleration'], setup: { carburettorKind: 'pump-around' } })).body;
    const done = rank.plan.slice(0, 2).map((p: { checkId: string }) => ({ checkId: p.checkId, result: 'looks-fine' }));
    const res = await open(racer, { kartId, symptoms: ['bog-on-acceleration'], results: done });
    expect(res.status).toBe(201);
    expect(res.body.results.map((r: { checkId: string }) => r.checkId)).toEqual(done.map((d: { checkId: string }) => d.checkId));
    expect(res.body.events.map((e: { type: string }) => e.type)).toEqual(['opened', 'check-recorded', 'check-recorded']);
  });

  it('lists the racer’s own cases newest change first, filterable by state and kart', async () => {
    const all = (await racer.get('/api/cases')).body.cases;
    expect(all.length).toBeGreaterThan(3);
    const stamps = all.map((c: { updatedAt: string }) => c.updatedAt);
    expect([...stamps].sort().reverse()).toEqual(stamps);
    const resolved = (await racer.get('/api/cases?state=resolved')).body.cases;
    expect(resolved.length).toBeGreaterThan(0);
    expect(resolved.every((c: { state: string }) => c.state === 'resolved')).toBe(true);
    expect((await racer.get('/api/cases?state=lost')).status).toBe(400);
    expect((await racer2.get('/api/cases')).body.cases).toEqual([]);
  });

  it('keeps other people out: 404 for another racer’s case and kart, for every step', async () => {
    const c: CaseDto = (await open(racer, { kartId, symptoms: ['hesitation'] })).body;
    expect((await racer2.get(`/api/cases/${c.id}`)).status).toBe(404);
    expect((await racer2.post(`/api/cases/${c.id}/results`).send({ checkId: c.rank.plan[0].checkId, result: 'looks-fine' })).status).toBe(404);
    expect((await racer2.post(`/api/cases/${c.id}/resolve`).send({ causeId: 'foam-degraded', fix: 'x' })).status).toBe(404);
    expect((await racer2.post(`/api/cases/${c.id}/abandon`).send({})).status).toBe(404);
    for (const role of ['coach', 'shop', 'admin'] as const) {
      const agent = await signedIn(t, demoUser(role));
      expect((await agent.get(`/api/cases/${c.id}`)).status).toBe(404);
    }
    // Opening a case on another racer's kart goes through the same policy: 404, nothing written.
    const before = (await t.db.db.select().from(cases)).length;
    const onOthersKart = await open(racer, { kartId: otherKartId, symptoms: ['hesitation'] });
    expect(onOthersKart.status).toBe(404);
    expect(onOthersKart.body.message).toBe('No such kart.');
    // An id that names no kart at all answers the same, so the two cannot be told apart.
    const noKart = await open(racer, { kartId: '00000000-0000-4000-8000-000000000000', symptoms: ['hesitation'] });
    expect(noKart.status).toBe(404);
    expect(noKart.body).toEqual(onOthersKart.body);
    expect((await t.db.db.select().from(cases)).length).toBe(before);
  });
});
