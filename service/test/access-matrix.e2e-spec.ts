import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { caseEvents, cases, karts, setups } from '@fuelwright/db';
import type { CaseDto } from '@fuelwright/shared';
import { createTestApp, demoUser, flushMail, linkToken, shareAndAccept, signedIn, type TestApp } from './test-app.js';

/**
 * The access policy (common/access/access-policy.ts) as a table over HTTP: who may do what with a
 * racer's kart and its cases.
 *
 * - The owner does everything.
 * - A coach the kart is shared with (kart scope, which covers its cases) may look: GET answers 200.
 *   So may a racer-role account that accepted a share (an invited coach signs up as a racer): the
 *   share grants it, not the role.
 *   Every write answers 404, not 403: the policy treats a write it does not allow exactly like an
 *   unknown id ("No such kart/case."), so a share grants reading and nothing about writing shows.
 * - Everyone else (another racer, a coach it is not shared with, a shop, an admin) gets 404 for
 *   everything: roles do not widen the policy.
 * Every refused request leaves the kart, its setups, the case and its events as they were.
 */
type Agent = ReturnType<typeof request.agent>;
const ACTORS = ['owner', 'racer2', 'sharedCoach', 'sharedRacer', 'otherCoach', 'shop', 'admin'] as const;
type Actor = (typeof ACTORS)[number];

interface Fixture {
  kartId: string;
  caseId: string;
  checkId: string;
}

interface Row {
  action: string;
  /** Reads are allowed to a shared coach; writes are not. */
  read: boolean;
  /** The owner's success status. */
  ok: number;
  /** Needs its own open case (a step changes the case for the next actor). */
  freshCase?: boolean;
  send(agent: Agent, f: Fixture): request.Test;
}

const ROWS: Row[] = [
  { action: 'GET kart', read: true, ok: 200, send: (a, f) => a.get(`/api/karts/${f.kartId}`) },
  { action: 'GET setups', read: true, ok: 200, send: (a, f) => a.get(`/api/karts/${f.kartId}/setups`) },
  { action: 'GET case', read: true, ok: 200, send: (a, f) => a.get(`/api/cases/${f.caseId}`) },
  { action: 'PATCH kart', read: false, ok: 200, send: (a, f) => a.patch(`/api/karts/${f.kartId}`).send({ name: 'Renamed' }) },
  { action: 'POST setup', read: false, ok: 201, send: (a, f) => a.post(`/api/karts/${f.kartId}/setups`).send({ takenOn: '2026-11-01', mainJet: 120 }) },
  { action: 'PUT symptoms', read: false, ok: 200, freshCase: true, send: (a, f) => a.put(`/api/cases/${f.caseId}/symptoms`).send({ symptoms: [{ id: 'hesitation' }] }) },
  { action: 'PUT facts', read: false, ok: 200, freshCase: true, send: (a, f) => a.put(`/api/cases/${f.caseId}/facts`).send({ conditions: { fuelAgeDays: 2 } }) },
  { action: 'POST result', read: false, ok: 200, freshCase: true, send: (a, f) => a.post(`/api/cases/${f.caseId}/results`).send({ checkId: f.checkId, result: 'looks-fine' }) },
  { action: 'POST resolve', read: false, ok: 200, freshCase: true, send: (a, f) => a.post(`/api/cases/${f.caseId}/resolve`).send({ causeId: 'foam-degraded', fix: 'New foam' }) },
  { action: 'POST abandon', read: false, ok: 200, freshCase: true, send: (a, f) => a.post(`/api/cases/${f.caseId}/abandon`).send({ reason: 'Out of time' }) },
  // Last: the owner's delete removes the kart (and its cases).
  { action: 'DELETE kart', read: false, ok: 204, send: (a, f) => a.delete(`/api/karts/${f.kartId}`) },
];

function expected(row: Row): Record<Actor, number> {
  return {
    owner: row.ok,
    racer2: 404,
    sharedCoach: row.read ? 200 : 404,
    sharedRacer: row.read ? 200 : 404,
    otherCoach: 404,
    shop: 404,
    admin: 404,
  };
}

describe('access matrix: actor x action on a racer’s kart and case', () => {
  let t: TestApp;
  const as = {} as Record<Actor, Agent>;
  let kartId: string;

  const openCase = async (): Promise<CaseDto> => {
    const res = await as.owner.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration', 'sporadic-running'] });
    expect(res.status).toBe(201);
    return res.body;
  };

  /** What a refused request must not change: the kart, its setups, the case and its events. */
  const stored = async (f: Fixture) => ({
    kart: await t.db.db.select().from(karts).where(eq(karts.id, f.kartId)),
    setups: await t.db.db.select().from(setups).where(eq(setups.kartId, f.kartId)),
    case: await t.db.db.select().from(cases).where(eq(cases.id, f.caseId)),
    events: await t.db.db.select().from(caseEvents).where(eq(caseEvents.caseId, f.caseId)),
  });

  let shared: CaseDto;
  beforeAll(async () => {
    t = await createTestApp({ throttleLimit: 1000 });
    as.owner = await signedIn(t, demoUser('racer'));
    as.racer2 = await signedIn(t, demoUser('racer2'));
    as.sharedCoach = await signedIn(t, demoUser('coach'));
    as.shop = await signedIn(t, demoUser('shop'));
    as.admin = await signedIn(t, demoUser('admin'));
    // A second coach, with no share: signs up as a racer, then the admin makes them a coach.
    as.otherCoach = request.agent(t.app.getHttpServer());
    const signUp = await as.otherCoach.post('/api/auth/sign-up').send({ email: 'coach.two@example.test', password: 'a long enough password', displayName: 'Second Coach' });
    expect(signUp.status).toBe(201);
    expect((await as.admin.patch(`/api/users/${signUp.body.user.id}/role`).send({ role: 'coach' })).body.user.role).toBe('coach');
    expect((await as.otherCoach.get('/api/auth/me')).body.user.role).toBe('coach');

    // The owner's kart, with a setup, shared (kart scope) with the demo coach, who accepts.
    kartId = (await as.owner.post('/api/karts').send({ name: 'Matrix', displacementCc: 100, drive: 'direct-drive', carburettorKind: 'pump-around' })).body.id;
    expect((await as.owner.post(`/api/karts/${kartId}/setups`).send({ takenOn: '2026-10-01', mainJet: 118 })).status).toBe(201);
    shared = await openCase();
    await shareAndAccept(t, as.owner, as.sharedCoach, 'coach@fuelwright.test', { scope: 'kart', kartId });
    // Someone with no account, invited to the same kart, signs up through the link: a racer account.
    const before2 = (await flushMail(t)).length;
    expect((await as.owner.post('/api/shares').send({ scope: 'kart', kartId, email: 'helper@example.test', as: 'coach' })).status).toBe(201);
    const invite2 = (await flushMail(t)).slice(before2).find((m) => m.to.includes('helper@example.test'))!;
    as.sharedRacer = request.agent(t.app.getHttpServer());
    const joined = await as.sharedRacer
      .post('/api/auth/sign-up')
      .send({ email: 'helper@example.test', password: 'a long enough password', displayName: 'Helper', invitationToken: linkToken(invite2, '/invitations/') });
    expect(joined.body.user.role).toBe('racer');
  });
  afterAll(() => t.close());

  for (const row of ROWS) {
    it(`${row.action}: ${JSON.stringify(expected(row))}`, async () => {
      const c = row.freshCase ? await openCase() : shared;
      const f: Fixture = { kartId, caseId: c.id, checkId: c.rank.plan[0].checkId };
      const before = await stored(f);
      const got = {} as Record<Actor, number>;
      // Everyone but the owner first: a refused request must leave everything as it was.
      for (const actor of ACTORS.filter((a) => a !== 'owner')) {
        const res = await row.send(as[actor], f);
        got[actor] = res.status;
        if (res.status === 404) expect(res.body.message, `${actor} ${row.action}`).toMatch(/^No such (kart|case)\.$/);
      }
      if (!row.read) expect(await stored(f), `${row.action} refused, nothing changed`).toEqual(before);
      got.owner = (await row.send(as.owner, f)).status;
      expect(got).toEqual(expected(row));
      // The owner's write did change something (the check above could otherwise pass vacuously).
      if (!row.read) expect(await stored(f)).not.toEqual(before);
    });
  }
});
