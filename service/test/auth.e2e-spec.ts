import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq, like } from 'drizzle-orm';
import { sessions, users } from '@fuelwright/db';
import { SIGN_IN_FAILED_MESSAGE } from '@fuelwright/shared';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

describe('auth over HTTP', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('signs up a new account as a racer, sets an httpOnly SameSite=Lax cookie, and /me returns it', async () => {
    const agent = request.agent(t.app.getHttpServer());
    const res = await agent
      .post('/api/auth/sign-up')
      .send({ email: '  New.Racer@Example.test ', password: 'long enough password', displayName: 'New Racer' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email: 'new.racer@example.test', role: 'racer', displayName: 'New Racer' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/fw_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('new.racer@example.test');
    // The password is stored as an argon2id hash, never as typed.
    const [row] = await t.db.db.select().from(users).where(eq(users.email, 'new.racer@example.test'));
    expect(row.passwordHash).toMatch(/^\$argon2id\$/);
  });

  it('rejects a bad sign-up with 400 naming each field, and writes nothing', async () => {
    const before = (await t.db.db.select().from(users)).length;
    const res = await t.http.post('/api/auth/sign-up').send({ email: 'not-an-address', password: 'short', displayName: '', role: 'admin' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['displayName', 'email', 'password', 'role']);
    expect(res.body.fields.password[0]).toMatch(/at least 10/);
    expect((await t.db.db.select().from(users)).length).toBe(before);
  });

  it('refuses a second account on the same e-mail, whatever its case', async () => {
    const res = await t.http.post('/api/auth/sign-up').send({ email: 'RACER@fuelwright.test', password: 'another long password', displayName: 'Copy' });
    expect(res.status).toBe(400);
    expect(res.body.fields.email[0]).toMatch(/already exists/);
  });

  it('answers a wrong password and an unknown e-mail with the same 401 and message', async () => {
    const wrong = await t.http.post('/api/auth/sign-in').send({ email: 'racer@fuelwright.test', password: 'not the password' });
    const unknown = await t.http.post('/api/auth/sign-in').send({ email: 'nobody@fuelwright.test', password: 'not the password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.message).toBe(SIGN_IN_FAILED_MESSAGE);
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });

  it('signs out: the session row is deleted and the old cookie no longer works', async () => {
    const agent = await signedIn(t, demoUser('coach'));
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    const count = async () => (await t.db.db.select().from(sessions)).length;
    const before = await count();
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    expect(await count()).toBe(before - 1);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('rejects a forged cookie', async () => {
    const res = await t.http.get('/api/auth/me').set('Cookie', 'fw_session=forged-token-value');
    expect(res.status).toBe(401);
    expect(res.body).toMatchObject({ statusCode: 401, error: 'Unauthorized' });
  });

  it('answers malformed JSON with a 400 in the API error shape', async () => {
    const res = await t.http.post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ statusCode: 400, error: 'Bad Request' });
  });

  it('serves the health route and the OpenAPI document to visitors', async () => {
    const health = await t.http.get('/api/health');
    expect(health.status).toBe(200);
    expect(health.body).toEqual({ status: 'ok', database: 'pglite' });
    const doc = await t.http.get('/api/docs/openapi.json');
    expect(doc.status).toBe(200);
    expect(Object.keys(doc.body.paths)).toEqual(expect.arrayContaining(['/api/auth/sign-in', '/api/auth/sign-up', '/api/auth/me', '/api/users']));
  });
});

describe('rate limits on sign-in', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ throttleLimit: 3, throttleTtlMs: 60_000 });
  });
  afterAll(() => t.close());

  it('answers 429 after the configured number of attempts in the window', async () => {
    const codes: number[] = [];
    for (let i = 0; i < 5; i++) {
      codes.push((await t.http.post('/api/auth/sign-in').send({ email: 'racer@fuelwright.test', password: 'wrong password' })).status);
    }
    expect(codes).toEqual([401, 401, 401, 429, 429]);
    const limited = await t.http.post('/api/auth/sign-in').send({ email: 'racer@fuelwright.test', password: 'wrong password' });
    expect(limited.body.message).toMatch(/Too many attempts/);
  });
});

describe('rate limits on sign-up', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ throttleLimit: 3, throttleTtlMs: 60_000 });
  });
  afterAll(() => t.close());

  it('answers 429 after the configured number of sign-ups in the window, and the refused ones write no account', async () => {
    const codes: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await t.http
        .post('/api/auth/sign-up')
        .send({ email: `burst${i}@example.test`, password: 'long enough password', displayName: `Burst ${i}` });
      codes.push(res.status);
      if (res.status === 429) expect(res.body.message).toMatch(/Too many attempts/);
    }
    expect(codes).toEqual([201, 201, 201, 429, 429]);
    const created = await t.db.db.select({ email: users.email }).from(users).where(like(users.email, 'burst%@example.test'));
    expect(created.map((u) => u.email).sort()).toEqual(['burst0@example.test', 'burst1@example.test', 'burst2@example.test']);
  });
});
