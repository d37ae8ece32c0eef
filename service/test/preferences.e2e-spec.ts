import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { users } from '@fuelwright/db';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

describe('unit preferences over HTTP', () => {
  let t: TestApp;
  let racer: Awaited<ReturnType<typeof signedIn>>;
  const stored = async (email: string) => (await t.db.db.select({ p: users.preferences }).from(users).where(eq(users.email, email)))[0].p;

  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
  });
  afterAll(() => t.close());

  it('answers the defaults (°C, hPa, m) until something is saved', async () => {
    const res = await racer.get('/api/me/preferences');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ units: { temperature: 'C', pressure: 'hPa', length: 'm' } });
  });

  it('saves the units in users.preferences, keeping other keys, for this user only', async () => {
    await t.db.db.update(users).set({ preferences: { other: 'kept' } }).where(eq(users.email, 'racer@fuelwright.test'));
    const put = await racer.put('/api/me/preferences').send({ units: { temperature: 'F', pressure: 'inHg', length: 'ft' } });
    expect(put.status).toBe(200);
    expect(put.body).toEqual({ units: { temperature: 'F', pressure: 'inHg', length: 'ft' } });
    expect((await racer.get('/api/me/preferences')).body).toEqual(put.body);
    expect(await stored('racer@fuelwright.test')).toEqual({ other: 'kept', units: { temperature: 'F', pressure: 'inHg', length: 'ft' } });
    const other = await signedIn(t, demoUser('racer2'));
    expect((await other.get('/api/me/preferences')).body.units).toEqual({ temperature: 'C', pressure: 'hPa', length: 'm' });
  });

  it('refuses units it does not know, field by field, and keeps what was saved', async () => {
    const before = await stored('racer@fuelwright.test');
    const bad = await racer.put('/api/me/preferences').send({ units: { temperature: 'K', pressure: 'bar', length: 'yd' } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields).sort()).toEqual(['units.length', 'units.pressure', 'units.temperature']);
    expect(bad.body.fields['units.pressure'][0]).toMatch(/inHg \(inches of mercury\)/);
    const none = await racer.put('/api/me/preferences').send({});
    expect(Object.keys(none.body.fields)).toEqual(['units']);
    const extra = await racer.put('/api/me/preferences').send({ units: { temperature: 'C', pressure: 'hPa', length: 'm' }, theme: 'dark' });
    expect(extra.status).toBe(400);
    expect(Object.keys(extra.body.fields)).toEqual(['theme']);
    expect(await stored('racer@fuelwright.test')).toEqual(before);
  });

  it('needs a session (visitors keep their units in the browser)', async () => {
    expect((await t.http.get('/api/me/preferences')).status).toBe(401);
    expect((await t.http.put('/api/me/preferences').send({ units: { temperature: 'C', pressure: 'hPa', length: 'm' } })).status).toBe(401);
  });
});
