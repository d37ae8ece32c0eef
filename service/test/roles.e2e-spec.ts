import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { users } from '@fuelwright/db';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

/** Who may use the admin routes: one row per role, plus a visitor. */
describe('access to user management, per role', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('refuses visitors with 401', async () => {
    expect((await t.http.get('/api/users')).status).toBe(401);
  });

  for (const role of ['racer', 'coach', 'shop'] as const) {
    it(`refuses the ${role} with 403 and changes nothing`, async () => {
      const agent = await signedIn(t, demoUser(role));
      expect((await agent.get('/api/users')).status).toBe(403);
      const [target] = await t.db.db.select().from(users).where(eq(users.email, 'racer2@fuelwright.test'));
      const res = await agent.patch(`/api/users/${target.id}/role`).send({ role: 'admin' });
      expect(res.status).toBe(403);
      const [after] = await t.db.db.select().from(users).where(eq(users.id, target.id));
      expect(after.role).toBe('racer');
    });
  }

  it('lets the admin list users and change a role, which the user sees at once', async () => {
    const admin = await signedIn(t, demoUser('admin'));
    const list = await admin.get('/api/users');
    expect(list.status).toBe(200);
    const target = list.body.users.find((u: { email: string }) => u.email === 'racer2@fuelwright.test');
    const racer2 = await signedIn(t, demoUser('racer2'));
    const res = await admin.patch(`/api/users/${target.id}/role`).send({ role: 'coach' });
    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('coach');
    expect((await racer2.get('/api/auth/me')).body.user.role).toBe('coach');
  });

  it('rejects an unknown role with 400 naming the field, and an admin changing their own role', async () => {
    const admin = await signedIn(t, demoUser('admin'));
    const me = (await admin.get('/api/auth/me')).body.user;
    const bad = await admin.patch(`/api/users/${me.id}/role`).send({ role: 'owner' });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.role[0]).toMatch(/one of: racer, coach, shop, admin/);
    const self = await admin.patch(`/api/users/${me.id}/role`).send({ role: 'racer' });
    expect(self.status).toBe(400);
    expect((await admin.get('/api/auth/me')).body.user.role).toBe('admin');
  });

  it('answers 404 for a user id that does not exist or is not a UUID', async () => {
    const admin = await signedIn(t, demoUser('admin'));
    expect((await admin.patch('/api/users/00000000-0000-4000-8000-000000000000/role').send({ role: 'shop' })).status).toBe(404);
    expect((await admin.patch('/api/users/not-a-uuid/role').send({ role: 'shop' })).status).toBe(404);
  });
});
