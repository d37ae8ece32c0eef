import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outcomes } from '@fuelwright/db';
import { SHIPPED_RULESET_VERSION } from '@fuelwright/rules';
import type { CaseDto, ProposalDto } from '@fuelwright/shared';
import { generateOutcomes } from '../../fixtures/generate-outcomes.js';
import { insertOutcomeRecords } from '../src/learning/demo-outcomes.js';
import { ProposalRunner } from '../src/learning/proposal-runner.js';
import { createTestApp, demoUser, shareAndAccept, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

describe('outcomes, insights and ruleset versions', () => {
  let t: TestApp;
  let racer: Agent;
  let shop: Agent;
  let admin: Agent;
  let kartId: string;
  let c: CaseDto;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    shop = await signedIn(t, demoUser('shop'));
    admin = await signedIn(t, demoUser('admin'));
    kartId = (await racer.get('/api/karts')).body.karts.find((k: { name: string }) => k.name === 'Blue 27').id;
    c = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration', 'sporadic-running'], setup: { foamFittedDate: '2024-01-10' } })).body;
  });
  afterAll(() => t.close());

  it('lets a racer log the outcome of their own case, with the opening ranking kept beside it', async () => {
    const res = await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['foam-degraded'], fix: 'New foam blocks', labourMinutes: 25 });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ caseId: c.id, rulesetVersion: c.rulesetVersion, confirmedCauses: ['foam-degraded'], current: true, topCauseId: c.openingRank.causes[0].id });
    const [row] = await t.db.db.select().from(outcomes);
    expect((row.openingRank as { firedRules: string[] }).firedRules.length).toBeGreaterThan(0);
  });

  it('corrects an outcome with a new entry; the first stays as it was and stops counting', async () => {
    const first = (await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['fuel-level-high'], fix: 'Return tube pushed home' })).body;
    const fixed = await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['return-tube-loose'], fix: 'Return tube pushed home', supersedesId: first.id });
    expect(fixed.status).toBe(201);
    const list = (await admin.get('/api/outcomes')).body.outcomes;
    expect(list.find((o: { id: string }) => o.id === first.id)).toMatchObject({ current: false, confirmedCauses: ['fuel-level-high'] });
    expect(list.find((o: { id: string }) => o.id === fixed.body.id).current).toBe(true);
    // Newest first.
    const stamps = list.map((o: { at: string }) => o.at);
    expect([...stamps].sort().reverse()).toEqual(stamps);
    // Insights count the correction, not the corrected entry.
    const pairs = (await admin.get('/api/insights')).body.insights.confirmed.map((x: { cause: string }) => x.cause);
    expect(pairs).toContain('return-tube-loose');
    expect(pairs).not.toContain('fuel-level-high');
  });

  it('refuses bad outcomes naming the field, and writes nothing', async () => {
    const before = (await t.db.db.select().from(outcomes)).length;
    expect((await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['gremlins'], fix: 'x' })).body.fields.confirmedCauses[0]).toMatch(/gremlins/);
    expect((await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['something-else'], fix: 'x' })).body.fields.otherNote).toBeDefined();
    expect((await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: [], fix: '', labourMinutes: -5 })).body.fields).toMatchObject({
      confirmedCauses: expect.any(Array),
      fix: expect.any(Array),
      labourMinutes: expect.any(Array),
    });
    // A shop the case is not shared with cannot log on it.
    expect((await shop.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['foam-degraded'], fix: 'x' })).status).toBe(404);
    expect((await t.db.db.select().from(outcomes)).length).toBe(before);
  });

  it('lets a shop log on a shared case and on a walk-in work order', async () => {
    await shareAndAccept(t, racer, shop, 'shop@fuelwright.test', { scope: 'case', caseId: c.id }, 'shop');
    const onCase = await shop.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['foam-degraded'], fix: 'Foam replaced', parts: 'foam set', labourMinutes: 20, stillFixed: true });
    expect(onCase.status).toBe(201);
    const wo = await shop.post('/api/work-orders').send({ customerName: 'Walk-in customer', kartDescription: '125 shifter', symptoms: ['fuel-from-vents'], setup: { carburettorKind: 'pump-around', ventLinesFitted: false } });
    expect(wo.status, JSON.stringify(wo.body)).toBe(201);
    const walkIn = await shop.post('/api/outcomes').send({ workOrderId: wo.body.id, confirmedCauses: ['vent-lines-off'], fix: 'Fitted vent lines routed up', labourMinutes: 10 });
    expect(walkIn.status).toBe(201);
    expect(walkIn.body.topCauseId).toBe('vent-lines-off');
    const orders = (await shop.get('/api/work-orders')).body.workOrders;
    expect(orders[0], JSON.stringify(orders)).toMatchObject({ status: 'done', outcomes: 1 });
    expect((await racer.post('/api/work-orders').send({ customerName: 'x', symptoms: ['hesitation'] })).status).toBe(403);
    expect((await shop.post('/api/work-orders').send({ symptoms: ['no-such'] })).body.fields).toMatchObject({ customerName: expect.any(Array) });
  });

  it('computes insights and exports CSV through a CSV library (quoted fields)', async () => {
    const res = await shop.get('/api/insights');
    expect(res.status).toBe(200);
    expect(res.body.outcomes).toBeGreaterThanOrEqual(3);
    expect(res.body.insights.accuracy).toBeDefined();
    expect((await racer.get('/api/insights')).status).toBe(403);
    const csv = await admin.get('/api/outcomes.csv');
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trim().split('\n');
    expect(lines[0]).toMatch(/^id,at,ruleset_version/);
    expect(lines.length).toBeGreaterThanOrEqual(5);
    expect((await admin.get('/api/insights.csv?table=pairs')).status).toBe(200);
    expect((await admin.get('/api/insights.csv?table=nope')).body.fields.table).toBeDefined();
  });

  it('publishes a proposal only as admin; a case ranked under N keeps N’s ranking after N+1; rollback works', async () => {
    await insertOutcomeRecords(t.db.db, generateOutcomes({ count: 600, seed: 3 }));
    for (const who of [racer, shop]) expect((await who.post('/api/rulesets/:v/activate'.replace(':v', SHIPPED_RULESET_VERSION))).status).toBe(403);
    expect((await racer.post('/api/rulesets/proposals').send({ strength: 100, version: '1.1.0' })).status).toBe(403);
    const started = await shop.post('/api/rulesets/proposals').send({ strength: 100, version: '1.1.0', seed: 5 });
    expect(started.status).toBe(201);
    await t.app.get(ProposalRunner).wait(started.body.id);
    const ready: ProposalDto = (await shop.get(`/api/rulesets/proposals/${started.body.id}`)).body;
    expect(ready.status).toBe('ready');
    expect(ready.progress).toBe(1);
    const result = ready.result as { backTest: { before: { top3: number }; after: { top3: number } }; priors: unknown[] };
    expect(result.backTest.before).toBeDefined();
    expect(result.priors.length).toBeGreaterThan(10);
    for (const who of [racer, shop]) expect((await who.post(`/api/rulesets/proposals/${ready.id}/publish`).send({})).status).toBe(403);
    const coach = await signedIn(t, demoUser('coach'));
    expect((await coach.post(`/api/rulesets/proposals/${ready.id}/publish`).send({})).status).toBe(403);
    const published = await admin.post(`/api/rulesets/proposals/${ready.id}/publish`).send({ notes: 'First re-fit' });
    expect(published.status).toBe(200);
    expect(published.body.status).toBe('published');
    expect((await admin.get('/api/rulesets')).body.active).toBe('1.1.0');
    expect((await t.http.get('/api/catalog')).body.version).toBe('1.1.0');
    // The old case still shows what the shipped version said, and takes further steps under it.
    const old: CaseDto = (await racer.get(`/api/cases/${c.id}`)).body;
    expect(old.rulesetVersion).toBe(SHIPPED_RULESET_VERSION);
    expect(old.openingRank).toEqual(c.openingRank);
    const step: CaseDto = (await racer.post(`/api/cases/${c.id}/results`).send({ checkId: old.rank.plan[0].checkId, result: 'looks-fine' })).body;
    expect(step.rank.version).toBe(SHIPPED_RULESET_VERSION);
    const fresh: CaseDto = (await racer.post('/api/cases').send({ kartId, symptoms: ['hesitation'] })).body;
    expect(fresh.rulesetVersion).toBe('1.1.0');
    // Versions are immutable: the same proposal cannot be published twice.
    expect((await admin.post(`/api/rulesets/proposals/${ready.id}/publish`).send({})).status).toBe(409);
    // Roll back.
    expect((await admin.post(`/api/rulesets/${SHIPPED_RULESET_VERSION}/activate`)).body).toEqual({ active: SHIPPED_RULESET_VERSION });
    expect((await t.http.get('/api/catalog')).body.version).toBe(SHIPPED_RULESET_VERSION);
    expect((await admin.post('/api/rulesets/9.9.9/activate')).status).toBe(404);
  });
});
