import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setups } from '@fuelwright/db';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

describe('setup snapshots over HTTP', () => {
  let t: TestApp;
  let racer: Awaited<ReturnType<typeof signedIn>>;
  let kartId: string;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    kartId = (await racer.get('/api/karts')).body.karts.find((k: { name: string }) => k.name === 'Blue 27').id;
  });
  afterAll(() => t.close());

  it('lists snapshots newest first, each with what changed from the one before', async () => {
    const res = await racer.get(`/api/karts/${kartId}/setups`);
    expect(res.status).toBe(200);
    const [newest, older] = res.body.setups;
    expect(newest.takenOn > older.takenOn).toBe(true);
    expect(newest.changedFields.sort()).toEqual(['airScrewTurnsOut', 'idleScrew', 'idleScrewTurns', 'mainJet']);
    expect(older.changedFields).toEqual([]);
  });

  it('records a snapshot with only some fields known', async () => {
    const res = await racer.post(`/api/karts/${kartId}/setups`).send({ takenOn: '2026-11-30', mainJet: 180, note: 'Cold morning' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ takenOn: '2026-11-30', mainJet: 180, note: 'Cold morning' });
    expect(res.body.pilotJet).toBeUndefined();
    expect(res.body.changedFields).toContain('mainJet');
  });

  it('refuses out-of-range values and future dates with a message per field, writing nothing', async () => {
    const before = (await t.db.db.select().from(setups)).length;
    const res = await racer.post(`/api/karts/${kartId}/setups`).send({
      takenOn: '2999-01-01',
      mainJet: 20,
      pilotJet: 90,
      needleClipGroove: 2.5,
      airScrewTurnsOut: 7,
      idleScrew: 'half',
      foamFittedDate: '2026-02-30',
      premixRatio: 'thirty-two',
      ventLinesFitted: 'yes',
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(
      ['airScrewTurnsOut', 'foamFittedDate', 'idleScrew', 'mainJet', 'needleClipGroove', 'pilotJet', 'premixRatio', 'takenOn', 'ventLinesFitted'].sort(),
    );
    expect(res.body.fields.mainJet[0]).toMatch(/from 50 to 400/);
    expect(res.body.fields.airScrewTurnsOut[0]).toMatch(/lightly seated/);
    expect(res.body.fields.needleClipGroove.join(' ')).toMatch(/from the top/);
    expect(res.body.fields.takenOn[0]).toMatch(/not in the future/);
    expect((await t.db.db.select().from(setups)).length).toBe(before);
  });

  it('keeps another racer out of this kart’s setups (404)', async () => {
    const other = await signedIn(t, demoUser('racer2'));
    expect((await other.get(`/api/karts/${kartId}/setups`)).status).toBe(404);
    expect((await other.post(`/api/karts/${kartId}/setups`).send({ takenOn: '2026-11-30' })).status).toBe(404);
  });
});
