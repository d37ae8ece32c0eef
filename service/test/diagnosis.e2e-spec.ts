import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { caseEvents, cases } from '@fuelwright/db';
import { createTestApp, type TestApp } from './test-app.js';

/**
 * The public diagnosis contract: GET /api/catalog and POST /api/diagnosis/rank, as a client that
 * knows only the documented fields would call them (no session, nothing saved).
 */
const RANK = '/api/diagnosis/rank';

const caution = { severity: expect.stringMatching(/^(caution|stop)$/), text: expect.any(String) };

describe('diagnosis contract over HTTP', () => {
  let t: TestApp;
  let casesBefore: number;
  let eventsBefore: number;
  beforeAll(async () => {
    // A high limit: this block sends many rank requests; the 429 is tested with a low one below.
    t = await createTestApp({ throttleLimit: 1000 });
    casesBefore = (await t.db.db.select().from(cases)).length;
    eventsBefore = (await t.db.db.select().from(caseEvents)).length;
  });
  afterAll(async () => {
    // Nothing the rank route answered was saved.
    expect((await t.db.db.select().from(cases)).length).toBe(casesBefore);
    expect((await t.db.db.select().from(caseEvents)).length).toBe(eventsBefore);
    await t.close();
  });

  it('GET /api/catalog gives the version, symptoms, causes and checks with their documented keys', async () => {
    const res = await t.http.get('/api/catalog');
    expect(res.status).toBe(200);
    const catalog = res.body;
    expect(catalog.version).toMatch(/^\d+\.\d+\.\d+$/);
    expect(catalog.symptoms.length).toBeGreaterThan(0);
    expect(catalog.causes.length).toBeGreaterThan(0);
    expect(catalog.checks.length).toBeGreaterThan(0);
    for (const s of catalog.symptoms) expect(s).toMatchObject({ id: expect.any(String), label: expect.any(String) });
    for (const c of catalog.causes) expect(c).toMatchObject({ id: expect.any(String), label: expect.any(String) });
    for (const c of catalog.checks) {
      expect(c).toMatchObject({ id: expect.any(String), label: expect.any(String), group: expect.any(String), minutes: expect.any(Number), cautions: expect.any(Array) });
      for (const k of c.cautions) expect(k).toMatchObject(caution);
    }
    // Ids are unique within each list.
    for (const list of [catalog.symptoms, catalog.causes, catalog.checks]) {
      const ids = list.map((x: { id: string }) => x.id);
      expect(new Set(ids).size).toBe(ids.length);
    }
    // The throttle check handles the throttle, so it carries a caution (product rule: cautions first).
    expect(catalog.checks.find((c: { id: string }) => c.id === 'throttle-return').cautions.length).toBeGreaterThan(0);
  });

  it('ranks bare symptom ids: version, causes with probability and reasons, and a plan with cautions', async () => {
    const catalog = (await t.http.get('/api/catalog')).body;
    const res = await t.http.post(RANK).send({ symptoms: ['bog-on-acceleration', 'sporadic-running'] });
    expect(res.status).toBe(200);
    const body = res.body;
    expect(body.version).toBe(catalog.version);
    expect(body.causes.length).toBeGreaterThan(0);
    const causeIds = new Set(catalog.causes.map((c: { id: string }) => c.id));
    for (const c of body.causes) {
      expect(c).toMatchObject({ id: expect.any(String), label: expect.any(String), probability: expect.any(Number), reasons: expect.any(Array) });
      expect(causeIds.has(c.id)).toBe(true);
      expect(c.probability).toBeGreaterThanOrEqual(0);
      expect(c.probability).toBeLessThanOrEqual(1);
    }
    // Most probable first.
    const ps = body.causes.map((c: { probability: number }) => c.probability);
    expect([...ps].sort((a, b) => b - a)).toEqual(ps);
    // "Something else" is not among the causes: the listed probabilities sum to 1 minus its share.
    expect(body.causes.map((c: { id: string }) => c.id)).not.toContain('something-else');
    expect(body.somethingElse.probability).toBeGreaterThan(0);
    expect(ps.reduce((a: number, b: number) => a + b, 0)).toBeCloseTo(1 - body.somethingElse.probability, 9);
    // The top cause says why.
    expect(body.causes[0].reasons.length).toBeGreaterThan(0);
    expect(body.plan.length).toBeGreaterThan(0);
    const checkIds = new Set(catalog.checks.map((c: { id: string }) => c.id));
    for (const p of body.plan) {
      expect(p).toMatchObject({ checkId: expect.any(String), label: expect.any(String), group: expect.any(String), minutes: expect.any(Number), cautions: expect.any(Array) });
      expect(checkIds.has(p.checkId)).toBe(true);
    }
    expect(body.stop).toBeUndefined();
  });

  it('takes symptoms as objects with band, engine and where (one value or several), same causes as bare ids', async () => {
    const bare = (await t.http.post(RANK).send({ symptoms: ['bog-on-acceleration', 'sporadic-running'] })).body;
    const res = await t.http.post(RANK).send({
      symptoms: [
        { id: 'bog-on-acceleration', band: 'up-to-quarter', engine: 'warm', where: 'corner-exit' },
        { id: 'sporadic-running', band: ['quarter-to-three-quarters', 'three-quarters-to-full'] },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(bare.version);
    expect(new Set(res.body.causes.map((c: { id: string }) => c.id))).toEqual(new Set(bare.causes.map((c: { id: string }) => c.id)));
    // The details are evidence: the ranking is not the bare one.
    expect(res.body.causes.map((c: { probability: number }) => c.probability)).not.toEqual(bare.causes.map((c: { probability: number }) => c.probability));
  });

  it('takes check results: a recorded check leaves the plan', async () => {
    const first = (await t.http.post(RANK).send({ symptoms: ['bog-on-acceleration'] })).body;
    const done = first.plan[0].checkId;
    const res = await t.http.post(RANK).send({ symptoms: ['bog-on-acceleration'], results: { [done]: 'looks-fine' } });
    expect(res.status).toBe(200);
    expect(res.body.plan.map((p: { checkId: string }) => p.checkId)).not.toContain(done);
  });

  it('answers a stop finding when the throttle does not snap back, and plans nothing further', async () => {
    // A throttle that does not return to closed is a reason not to drive: common practice, no
    // published source (the shipped ruleset's stop-findings.json carries it).
    const res = await t.http.post(RANK).send({ symptoms: ['throttle-slow-to-return'], results: { 'throttle-return': 'fault-found' } });
    expect(res.status).toBe(200);
    expect(res.body.stop).toMatchObject({ reason: expect.stringMatching(/throttle/i) });
    expect(res.body.plan).toEqual([]);
    const fine = await t.http.post(RANK).send({ symptoms: ['throttle-slow-to-return'], results: { 'throttle-return': 'looks-fine' } });
    expect(fine.body.stop).toBeUndefined();
  });

  it('answers 400 naming unknown symptom ids, bare or in an object', async () => {
    const res = await t.http.post(RANK).send({ symptoms: ['bog-on-acceleration', 'engine-sad', { id: 'engine-grumpy', band: 'up-to-quarter' }] });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/engine-sad/);
    expect(res.body.message).toMatch(/engine-grumpy/);
    expect(res.body.fields['symptoms.1']).toEqual([expect.stringMatching(/engine-sad/)]);
    expect(res.body.fields['symptoms.2.id']).toEqual([expect.stringMatching(/engine-grumpy/)]);
  });

  it('answers 400 naming unknown check ids', async () => {
    const res = await t.http.post(RANK).send({ symptoms: ['hesitation'], results: { 'no-such-check': 'looks-fine', 'throttle-return': 'looks-fine' } });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/no-such-check/);
    expect(Object.keys(res.body.fields)).toEqual(['results.no-such-check']);
  });

  it('answers 400 naming the field for a result outside the three values and a malformed symptom', async () => {
    const bad = await t.http.post(RANK).send({ symptoms: [{ id: 'hesitation', band: 'sideways' }], results: { 'throttle-return': 'maybe' } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(expect.arrayContaining(['results.throttle-return']));
    expect(Object.keys(bad.body.fields).some((f) => f.startsWith('symptoms.0'))).toBe(true);
  });

  it('answers 400 naming the field for a foam-fitted or rebuild date in the future, like the setup form', async () => {
    const future = new Date(Date.now() + 3 * 24 * 3600 * 1000).toISOString().slice(0, 10);
    const res = await t.http.post(RANK).send({ symptoms: ['sporadic-running'], setup: { foamFittedDate: future, lastRebuildDate: future } });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ 'setup.foamFittedDate': [expect.stringMatching(/future/)], 'setup.lastRebuildDate': [expect.stringMatching(/future/)] });
    const today = new Date().toISOString().slice(0, 10);
    expect((await t.http.post(RANK).send({ symptoms: ['sporadic-running'], setup: { foamFittedDate: today, lastRebuildDate: '2025-06-01' } })).status).toBe(200);
  });

  it('describes both routes in the OpenAPI document', async () => {
    const res = await t.http.get('/api/docs/openapi.json');
    expect(res.status).toBe(200);
    const paths = res.body.paths;
    expect(paths['/api/catalog'].get.responses['200'].content['application/json'].schema.required).toEqual(
      expect.arrayContaining(['version', 'symptoms', 'causes', 'checks']),
    );
    const rank = paths['/api/diagnosis/rank'].post;
    expect(rank.requestBody.content['application/json'].schema.required).toEqual(['symptoms']);
    const ok = rank.responses['200'].content['application/json'].schema;
    expect(ok.required).toEqual(expect.arrayContaining(['version', 'causes', 'plan']));
    expect(Object.keys(ok.properties)).toEqual(expect.arrayContaining(['version', 'causes', 'plan', 'stop']));
    // Each item names what the contract guarantees; the extras are described, and clients are told to ignore unknown fields.
    expect(ok.properties.causes.items.required).toEqual(['id', 'label', 'probability', 'reasons']);
    expect(ok.properties.causes.items.properties.reasons.items.required).toEqual(expect.arrayContaining(['kind', 'text']));
    expect(ok.properties.plan.items.required).toEqual(['checkId', 'label', 'group', 'minutes', 'cautions']);
    expect(ok.properties.stop.required).toEqual(['reason']);
    for (const extra of ['somethingElse', 'excluded', 'expectedMinutes', 'cautions']) expect(ok.properties[extra]?.description, extra).toMatch(/\S/);
    for (const extra of ['prior', 'logOdds', 'fixes']) expect(ok.properties.causes.items.properties[extra], extra).toBeDefined();
    for (const extra of ['openingMinutes', 'findProbability', 'causes', 'safetyFirst']) expect(ok.properties.plan.items.properties[extra], extra).toBeDefined();
    expect(ok.description).toMatch(/must ignore/i);
    // Every field a response carries today is described (a stop, and a carburettor kind that excludes causes).
    const sample = (await t.http.post(RANK).send({ symptoms: ['throttle-slow-to-return'], setup: { carburettorKind: 'float-valve' }, results: { 'throttle-return': 'fault-found' } })).body;
    const open = (await t.http.post(RANK).send({ symptoms: ['bog-on-acceleration'], setup: { carburettorKind: 'pump-around' } })).body;
    expect(sample.stop).toBeDefined();
    const missing = (keys: string[], documented: object) => keys.filter((k) => !(k in documented));
    expect(missing(Object.keys(sample), ok.properties)).toEqual([]);
    expect(missing(Object.keys(open.causes[0]), ok.properties.causes.items.properties)).toEqual([]);
    expect(missing(Object.keys(open.causes[0].reasons[0]), ok.properties.causes.items.properties.reasons.items.properties)).toEqual([]);
    expect(missing(Object.keys(open.plan[0]), ok.properties.plan.items.properties)).toEqual([]);
    expect(missing(Object.keys(sample.stop), ok.properties.stop.properties)).toEqual([]);
    expect(rank.responses['400']).toBeDefined();
    expect(rank.responses['429']).toBeDefined();
  });
});

describe('POST /api/diagnosis/rank rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ throttleLimit: 3, throttleTtlMs: 60_000 });
  });
  afterAll(() => t.close());

  it('answers 429 once a visitor passes the limit', async () => {
    const agent = request(t.app.getHttpServer());
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await agent.post(RANK).send({ symptoms: ['hesitation'] })).status);
    expect(statuses).toEqual([200, 200, 200, 429]);
  });
});
