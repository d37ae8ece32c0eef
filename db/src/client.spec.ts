import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import { PGlite } from '@electric-sql/pglite';
import { PGLiteSocketServer } from '@electric-sql/pglite-socket';
import { openDatabase } from './client.js';
import { karts, users } from './schema/index.js';
import { readDemoFixture, seedDemoIfEmpty } from './seed.js';

describe('database client and demo seed', () => {
  it('migrates an in-memory PGlite, seeds the demo club once, and keeps kart owners consistent', async () => {
    const handle = await openDatabase({ memory: true });
    try {
      await handle.migrate();
      const fixture = readDemoFixture();
      const fakeHash = async (p: string) => `hashed:${p}`;
      expect(await seedDemoIfEmpty(handle.db, fakeHash)).toBe(true);
      expect(await seedDemoIfEmpty(handle.db, fakeHash)).toBe(false);
      const all = await handle.db.select().from(users);
      expect(all.map((u) => u.email).sort()).toEqual(fixture.users.map((u) => u.email).sort());
      expect(new Set(all.map((u) => u.role))).toEqual(new Set(['racer', 'coach', 'shop', 'admin']));
      const racer = all.find((u) => u.email === 'racer@fuelwright.test')!;
      const racerKarts = await handle.db.select().from(karts).where(eq(karts.ownerId, racer.id));
      expect(racerKarts.length).toBe(fixture.karts.filter((k) => k.owner === racer.email).length);
    } finally {
      await handle.close();
    }
  }, 30_000);

  it('rejects a fixture kart whose owner is not in the fixture, writing nothing', async () => {
    const handle = await openDatabase({ memory: true });
    try {
      await handle.migrate();
      const fixture = readDemoFixture();
      const bad = { ...fixture, karts: [{ ...fixture.karts[0], owner: 'nobody@fuelwright.test' }] };
      await expect(seedDemoIfEmpty(handle.db, async (p) => p, bad)).rejects.toThrow(/unknown owner/);
      expect(await handle.db.select().from(users)).toHaveLength(0);
    } finally {
      await handle.close();
    }
  }, 30_000);
});

// The DATABASE_URL path (node-postgres) against a PostgreSQL wire-protocol server: an in-memory
// PGlite served on loopback by @electric-sql/pglite-socket, so no PostgreSQL binary is needed.
// The socket server takes one connection at a time, hence a pool of one.
describe('database client over a PostgreSQL URL (node-postgres driver)', () => {
  let server: PGLiteSocketServer;
  let engine: PGlite;
  let url: string;
  beforeAll(async () => {
    engine = await PGlite.create();
    server = new PGLiteSocketServer({ db: engine, host: '127.0.0.1', port: 0 });
    await server.start();
    url = `postgres://postgres@${server.getServerConn()}/postgres`;
  }, 30_000);
  afterAll(async () => {
    await server.stop();
    await engine.close();
  });

  it('applies the real migrations, writes and reads through the pool, and the rows are on the server', async () => {
    const handle = await openDatabase({ databaseUrl: url, poolMax: 1 });
    try {
      expect(handle.kind).toBe('postgres');
      expect(handle.pglite).toBeUndefined();
      await handle.migrate();
      // Applying them again is a no-op (the journal in the server says they are done).
      await handle.migrate();
      const [written] = await handle.db
        .insert(users)
        .values({ email: 'url-path@fuelwright.test', passwordHash: 'hashed:x', displayName: 'Url Path', role: 'coach' })
        .returning();
      const [read] = await handle.db.select().from(users).where(eq(users.id, written.id));
      expect(read.email).toBe('url-path@fuelwright.test');
      expect(read.role).toBe('coach');
      // The shared Db type leaves execute() untyped; node-postgres answers with { rows }.
      const migrated = (await handle.db.execute(sql`select count(*)::int as n from drizzle.__drizzle_migrations`)) as unknown as {
        rows: { n: number }[];
      };
      expect(migrated.rows[0].n).toBeGreaterThan(0);
    } finally {
      await handle.close();
    }
    // Seen by the engine behind the socket, not only by the pool that wrote it.
    const direct = await engine.query<{ email: string }>('select email from users');
    expect(direct.rows.map((r) => r.email)).toEqual(['url-path@fuelwright.test']);
  }, 60_000);
});
