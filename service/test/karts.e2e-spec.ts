import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { karts } from '@fuelwright/db';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

describe('karts over HTTP', () => {
  let t: TestApp;
  let racer: Awaited<ReturnType<typeof signedIn>>;
  let racer2: Awaited<ReturnType<typeof signedIn>>;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    racer2 = await signedIn(t, demoUser('racer2'));
  });
  afterAll(() => t.close());

  it('lists only the signed-in racer’s own karts', async () => {
    const mine = (await racer.get('/api/karts')).body.karts;
    const theirs = (await racer2.get('/api/karts')).body.karts;
    expect(mine.map((k: { name: string }) => k.name).sort()).toEqual(['Blue 27', 'Practice chassis']);
    expect(theirs.map((k: { name: string }) => k.name)).toEqual(['Yellow 8']);
    expect(mine.every((k: { ownerName: string }) => k.ownerName === 'Tamsin Vell')).toBe(true);
  });

  it('creates, updates and deletes a kart', async () => {
    const created = await racer.post('/api/karts').send({ name: '  Spare  ', displacementCc: 125, drive: 'gearbox', carburettorKind: 'pump-around' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Spare', notes: '', carburettorKind: 'pump-around' });
    const updated = await racer.patch(`/api/karts/${created.body.id}`).send({ notes: 'New foam fitted.' });
    expect(updated.status).toBe(200);
    expect(updated.body).toMatchObject({ name: 'Spare', notes: 'New foam fitted.' });
    expect((await racer.delete(`/api/karts/${created.body.id}`)).status).toBe(204);
    expect((await racer.get(`/api/karts/${created.body.id}`)).status).toBe(404);
  });

  it('rejects bad input with a message per field and writes nothing', async () => {
    const before = (await t.db.db.select().from(karts)).length;
    const res = await racer.post('/api/karts').send({ name: '', displacementCc: 12.5, drive: 'chain', carburettorKind: 'injector' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['carburettorKind', 'displacementCc', 'drive', 'name']);
    expect(res.body.fields.carburettorKind[0]).toMatch(/pump-around/);
    expect((await t.db.db.select().from(karts)).length).toBe(before);
    const tooBig = await racer.post('/api/karts').send({ name: 'Big', displacementCc: 400, drive: 'gearbox', carburettorKind: 'float-valve' });
    expect(tooBig.body.fields.displacementCc[0]).toMatch(/at most 250/);
  });

  it('answers 404 (not 403) for another racer’s kart, for every verb, and changes nothing', async () => {
    const theirs = (await racer2.get('/api/karts')).body.karts[0];
    expect((await racer.get(`/api/karts/${theirs.id}`)).status).toBe(404);
    expect((await racer.patch(`/api/karts/${theirs.id}`).send({ name: 'Mine now' })).status).toBe(404);
    expect((await racer.delete(`/api/karts/${theirs.id}`)).status).toBe(404);
    expect((await racer2.get(`/api/karts/${theirs.id}`)).body.name).toBe('Yellow 8');
  });

  it('gives coaches, shops and admins no access to karts not shared with them', async () => {
    const theirs = (await racer2.get('/api/karts')).body.karts[0];
    for (const role of ['coach', 'shop', 'admin'] as const) {
      const agent = await signedIn(t, demoUser(role));
      expect((await agent.get(`/api/karts/${theirs.id}`)).status).toBe(404);
    }
  });

  it('needs a session', async () => {
    expect((await t.http.get('/api/karts')).status).toBe(401);
  });
});
