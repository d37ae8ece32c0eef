import { describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
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
