import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { PGlite } from '@electric-sql/pglite';
import { PGLiteSocketServer } from '@electric-sql/pglite-socket';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { openDatabase, seedDemoIfEmpty } from '@fuelwright/db';
import { hashPassword } from '../src/auth/password.js';
import { demoUser, startTestApp, type TestApp } from './test-app.js';

// The whole app on the DATABASE_URL path: drizzle's node-postgres driver talking the PostgreSQL
// wire protocol to an in-memory PGlite served on loopback by @electric-sql/pglite-socket (no
// PostgreSQL binary needed). The socket server takes one connection at a time: a pool of one.
describe('the app on a PostgreSQL server (node-postgres driver)', () => {
  let engine: PGlite;
  let server: PGLiteSocketServer;
  let t: TestApp;
  let app: NestExpressApplication;

  beforeAll(async () => {
    engine = await PGlite.create();
    server = new PGLiteSocketServer({ db: engine, host: '127.0.0.1', port: 0 });
    await server.start();
    const handle = await openDatabase({ databaseUrl: `postgres://postgres@${server.getServerConn()}/postgres`, poolMax: 1 });
    expect(handle.kind).toBe('postgres');
    await handle.migrate();
    expect(await seedDemoIfEmpty(handle.db, hashPassword)).toBe(true);
    t = await startTestApp(handle);
    app = t.app;
  }, 120_000);

  afterAll(async () => {
    await t?.close();
    await server?.stop();
    await engine?.close();
  });

  it('signs a demo account in, and the session row is written on the server', async () => {
    const agent = request.agent(app.getHttpServer());
    const res = await agent.post('/api/auth/sign-in').send(demoUser('coach'));
    expect(res.status).toBe(200);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toMatchObject({ email: 'coach@fuelwright.test', role: 'coach' });
    const rows = await engine.query<{ n: number }>(
      `select count(*)::int as n from sessions s join users u on u.id = s.user_id where u.email = 'coach@fuelwright.test'`,
    );
    expect(rows.rows[0].n).toBe(1);
  });

  it('signs up a new racer through the server and reads the account back', async () => {
    const agent = request.agent(app.getHttpServer());
    const res = await agent
      .post('/api/auth/sign-up')
      .send({ email: 'url.racer@example.test', password: 'long enough password', displayName: 'Url Racer' });
    expect(res.status).toBe(201);
    expect((await agent.get('/api/auth/me')).body.user).toMatchObject({ email: 'url.racer@example.test', role: 'racer' });
    const direct = await engine.query<{ role: string }>(`select role from users where email = 'url.racer@example.test'`);
    expect(direct.rows).toEqual([{ role: 'racer' }]);
  });

  it('answers a wrong password with 401 and writes no session', async () => {
    const before = await engine.query<{ n: number }>('select count(*)::int as n from sessions');
    const res = await request(app.getHttpServer()).post('/api/auth/sign-in').send({ ...demoUser('racer'), password: 'wrong password' });
    expect(res.status).toBe(401);
    const after = await engine.query<{ n: number }>('select count(*)::int as n from sessions');
    expect(after.rows[0].n).toBe(before.rows[0].n);
  });
});
