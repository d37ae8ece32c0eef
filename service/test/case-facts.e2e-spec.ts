/**
 * Correcting an open case's setup and the day's air (PUT /api/cases/:id/facts): the case ranks
 * again under its own version with the results so far, the opening ranking is kept, the timeline
 * shows the step, bad input names the field and writes nothing, and only the owner of an open
 * case may do it. The rule that fires is the shipped ruleset's "denser-air-lean-top" (3 % or more
 * denser air with a lean top end points at the air density; rules/src/rulesets/1.0.1), not a
 * figure invented here.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { caseEvents } from '@fuelwright/db';
import type { CaseDto } from '@fuelwright/shared';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

describe('correcting the facts of an open case', () => {
  let t: TestApp;
  let racer: Agent;
  let racer2: Agent;
  let coach: Agent;
  let kartId: string;
  let c: CaseDto;
  const probability = (dto: CaseDto, id: string) => dto.rank.causes.find((x) => x.id === id)?.probability ?? 0;

  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    racer2 = await signedIn(t, demoUser('racer2'));
    coach = await signedIn(t, demoUser('coach'));
    kartId = (await racer.get('/api/karts')).body.karts.find((k: { name: string }) => k.name === 'Blue 27').id;
    c = (await racer.post('/api/cases').send({ kartId, symptoms: ['lean-top-end'] })).body;
    expect(c.state).toBe('open');
  });
  afterAll(() => t.close());

  it('takes denser air today, ranks again with the air rule, and keeps the opening ranking', async () => {
    const res = await racer.put(`/api/cases/${c.id}/facts`).send({ conditions: { densityChangePct: 5, fuelAgeDays: 2 } });
    expect(res.status).toBe(200);
    const after: CaseDto = res.body;
    expect(after.conditions).toMatchObject({ densityChangePct: 5, fuelAgeDays: 2 });
    expect(probability(after, 'air-density-changed')).toBeGreaterThan(probability(c, 'air-density-changed'));
    const reasons = after.rank.causes.find((x) => x.id === 'air-density-changed')!.reasons.map((r) => r.ruleId);
    expect(reasons).toContain('denser-air-lean-top');
    // The opening ranking (what outcomes are measured against) is what it was.
    expect(after.openingRank).toEqual(c.openingRank);
    expect(after.setup).toEqual(c.setup);
    expect(after.events.map((e) => e.type)).toEqual(['opened', 'facts-corrected']);
  });

  it('corrects the setup; the carburettor kind stays the kart’s', async () => {
    const res = await racer.put(`/api/cases/${c.id}/facts`).send({ setup: { ...c.setup, mainJet: 175, carburettorKind: 'float-valve' } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.setup).toMatchObject({ mainJet: 175, carburettorKind: c.setup.carburettorKind });
    // The conditions given before are kept when only the setup is corrected.
    expect(res.body.conditions).toMatchObject({ densityChangePct: 5 });
    expect(res.body.events.at(-1).summary).toMatch(/main jet 175/);
  });

  it('refuses bad input naming the field, and writes nothing', async () => {
    const before = (await t.db.db.select().from(caseEvents)).length;
    const bad = await racer.put(`/api/cases/${c.id}/facts`).send({ setup: { mainJet: -4 } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toContain('setup.mainJet');
    const empty = await racer.put(`/api/cases/${c.id}/facts`).send({});
    expect(empty.status).toBe(400);
    expect(empty.body.fields.setup[0]).toMatch(/setup, the conditions, or both/);
    const notNumber = await racer.put(`/api/cases/${c.id}/facts`).send({ conditions: { densityChangePct: 'lots' } });
    expect(Object.keys(notNumber.body.fields)).toContain('conditions.densityChangePct');
    expect((await t.db.db.select().from(caseEvents)).length).toBe(before);
  });

  it('is the owner’s step only, and only while the case is open', async () => {
    expect((await racer2.put(`/api/cases/${c.id}/facts`).send({ conditions: { densityChangePct: 1 } })).status).toBe(404);
    expect((await coach.put(`/api/cases/${c.id}/facts`).send({ conditions: { densityChangePct: 1 } })).status).toBe(404);
    const top = c.rank.causes[0].id;
    expect((await racer.post(`/api/cases/${c.id}/resolve`).send({ causeId: top, fix: 'Jetted up one size' })).status).toBe(200);
    const late = await racer.put(`/api/cases/${c.id}/facts`).send({ conditions: { densityChangePct: 1 } });
    expect(late.status).toBe(409);
  });
});
