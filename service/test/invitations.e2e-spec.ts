import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { and, eq } from 'drizzle-orm';
import { authTokens } from '@fuelwright/db';
import { createTestApp, demoUser, flushMail, linkToken, shareAndAccept, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

describe('the invitation notice follows the invitee’s own setting when they have an account', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  let kartId: string;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
    kartId = (await racer.get('/api/karts')).body.karts[0].id;
  });
  afterAll(() => t.close());

  const invitationsTo = async (email: string, since: number) => (await flushMail(t)).slice(since).filter((m) => m.to.includes(email));

  it('carries an unsubscribe link for an existing account, and none for an address without one', async () => {
    const before = (await flushMail(t)).length;
    expect((await racer.post('/api/shares').send({ scope: 'kart', kartId, email: 'coach@fuelwright.test', as: 'coach' })).status).toBe(201);
    expect((await racer.post('/api/shares').send({ scope: 'kart', kartId, email: 'nobody.yet@example.test', as: 'coach' })).status).toBe(201);
    const [known] = await invitationsTo('coach@fuelwright.test', before);
    const [unknown] = await invitationsTo('nobody.yet@example.test', before);
    expect(known.text).toMatch(/Stop these e-mails: http:\/\/fuelwright\.test\/unsubscribe\?token=/);
    expect(unknown.text).not.toMatch(/unsubscribe/);
    // The link turns off invitations for that account.
    const token = decodeURIComponent(linkToken(known, '/unsubscribe?token='));
    expect((await t.http.post('/api/notifications/unsubscribe').send({ token })).body).toEqual({ kind: 'invitation' });
    expect((await coach.get('/api/me/notifications')).body.notices).toMatchObject({ invitation: false });
  });

  it('sends no invitation to an account that turned invitations off; the racer’s answer does not change', async () => {
    const before = (await flushMail(t)).length;
    const c = (await racer.post('/api/cases').send({ kartId, symptoms: ['hesitation'] })).body;
    const off = await racer.post('/api/shares').send({ scope: 'case', caseId: c.id, email: 'coach@fuelwright.test', as: 'coach' });
    expect(off.status).toBe(201);
    expect(off.body.status).toBe('invited');
    expect(await invitationsTo('coach@fuelwright.test', before)).toEqual([]);
    await coach.put('/api/me/notifications').send({ invitation: true });
    const c2 = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration'] })).body;
    await racer.post('/api/shares').send({ scope: 'case', caseId: c2.id, email: 'coach@fuelwright.test', as: 'coach' });
    expect(await invitationsTo('coach@fuelwright.test', before)).toHaveLength(1);
  });
});

describe('the shared-cases dashboard: open first, newest change first', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
  });
  afterAll(() => t.close());

  it('moves a case up when someone comments or asks for a photo; a closed case stays below the open ones', async () => {
    const kartId = (await racer.get('/api/karts')).body.karts[0].id;
    const a = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration'] })).body;
    const b = (await racer.post('/api/cases').send({ kartId, symptoms: ['sporadic-running'] })).body;
    const closed = (await racer.post('/api/cases').send({ kartId, symptoms: ['hesitation'] })).body;
    expect((await racer.post(`/api/cases/${closed.id}/resolve`).send({ causeId: 'vent-lines-off', fix: 'Refitted the vent lines' })).status).toBe(200);
    await shareAndAccept(t, racer, coach, 'coach@fuelwright.test', { scope: 'kart', kartId });
    const ours = [a.id, b.id, closed.id];
    const order = async () => ((await coach.get('/api/shared-cases')).body.cases as { id: string }[]).map((x) => x.id).filter((id) => ours.includes(id));

    expect(await order()).toEqual([b.id, a.id, closed.id]);
    expect((await coach.post(`/api/cases/${a.id}/comments`).send({ body: 'Which fuel can did you use?' })).status).toBe(201);
    expect(await order()).toEqual([a.id, b.id, closed.id]);
    expect((await coach.post(`/api/cases/${b.id}/photo-requests`).send({ what: 'The plug' })).status).toBe(201);
    expect(await order()).toEqual([b.id, a.id, closed.id]);
    expect((await racer.post(`/api/cases/${a.id}/comments`).send({ body: 'The new one' })).status).toBe(201);
    expect(await order()).toEqual([a.id, b.id, closed.id]);
    // A comment on a resolved case is its newest change, but open cases still come first.
    const resolvedAt = Date.parse((await racer.get(`/api/cases/${closed.id}`)).body.updatedAt);
    expect((await coach.post(`/api/cases/${closed.id}/comments`).send({ body: 'Glad it runs' })).status).toBe(201);
    expect(await order()).toEqual([a.id, b.id, closed.id]);
    expect(Date.parse((await racer.get(`/api/cases/${closed.id}`)).body.updatedAt)).toBeGreaterThan(resolvedAt);
  });
});

describe('expired and withdrawn links', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  let caseId: string;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
    const kartId = (await racer.get('/api/karts')).body.karts[0].id;
    caseId = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration'] })).body.id;
  });
  afterAll(() => t.close());

  /** Moves the expiry of every token of this kind for this address into the past. */
  const expire = (kind: 'invitation' | 'email-verification' | 'password-reset', email: string) =>
    t.db.db
      .update(authTokens)
      .set({ expiresAt: new Date(Date.now() - 60_000) })
      .where(and(eq(authTokens.kind, kind), eq(authTokens.email, email)));
  const newAccount = (email: string, invitationToken?: string) =>
    request
      .agent(t.app.getHttpServer())
      .post('/api/auth/sign-up')
      .send({ email, password: 'a long password here', displayName: 'Someone', ...(invitationToken ? { invitationToken } : {}) });
  const invite = async (email: string) => {
    const before = (await flushMail(t)).length;
    const share = await racer.post('/api/shares').send({ scope: 'case', caseId, email, as: 'coach' });
    expect(share.status).toBe(201);
    const mail = (await flushMail(t)).slice(before).find((m) => m.to.includes(email))!;
    return { shareId: share.body.id as string, token: linkToken(mail, '/invitations/') };
  };

  it('refuses an expired invitation, both to accept and to sign up with; the case stays closed', async () => {
    const known = await invite('coach@fuelwright.test');
    const unknown = await invite('late.coach@example.test');
    await expire('invitation', 'coach@fuelwright.test');
    await expire('invitation', 'late.coach@example.test');
    const accepted = await coach.post('/api/invitations/accept').send({ token: known.token });
    expect(accepted.status).toBe(400);
    expect(accepted.body.fields.token[0]).toMatch(/expired/);
    expect((await coach.get(`/api/cases/${caseId}`)).status).toBe(404);
    const signUp = await newAccount('late.coach@example.test', unknown.token);
    expect(signUp.status).toBe(400);
    expect(signUp.body.fields.invitationToken[0]).toMatch(/expired/);
    // Nothing was written: no account exists for the address.
    expect((await t.http.post('/api/auth/sign-in').send({ email: 'late.coach@example.test', password: 'a long password here' })).status).toBe(401);
  });

  it('refuses an invitation the racer revoked before it was used, to accept and to sign up with', async () => {
    const known = await invite('coach@fuelwright.test');
    const unknown = await invite('withdrawn.coach@example.test');
    expect((await racer.delete(`/api/shares/${known.shareId}`)).body.status).toBe('revoked');
    expect((await racer.delete(`/api/shares/${unknown.shareId}`)).body.status).toBe('revoked');
    const accepted = await coach.post('/api/invitations/accept').send({ token: known.token });
    expect(accepted.status).toBe(400);
    expect(accepted.body.fields.token[0]).toMatch(/withdrawn/);
    expect((await coach.get(`/api/cases/${caseId}`)).status).toBe(404);
    const signUp = await newAccount('withdrawn.coach@example.test', unknown.token);
    expect(signUp.status).toBe(400);
    expect(signUp.body.fields.invitationToken[0]).toMatch(/withdrawn/);
    expect((await t.http.post('/api/auth/sign-in').send({ email: 'withdrawn.coach@example.test', password: 'a long password here' })).status).toBe(401);
  });

  it('refuses an expired password-reset link; the old password still works', async () => {
    const before = (await flushMail(t)).length;
    expect((await t.http.post('/api/auth/request-password-reset').send({ email: 'racer2@fuelwright.test' })).status).toBe(202);
    const mail = (await flushMail(t)).slice(before).find((m) => m.to.includes('racer2@fuelwright.test'))!;
    const token = linkToken(mail, '/reset-password?token=');
    await expire('password-reset', 'racer2@fuelwright.test');
    const res = await t.http.post('/api/auth/reset-password').send({ token, password: 'a brand new password' });
    expect(res.status).toBe(400);
    expect(res.body.fields.token).toBeDefined();
    expect((await t.http.post('/api/auth/sign-in').send(demoUser('racer2'))).status).toBe(200);
  });

  it('refuses an expired e-mail verification link; the address stays unverified', async () => {
    const agent = request.agent(t.app.getHttpServer());
    const before = (await flushMail(t)).length;
    expect((await agent.post('/api/auth/sign-up').send({ email: 'slow.reader@example.test', password: 'a long password here', displayName: 'Slow' })).status).toBe(201);
    const mail = (await flushMail(t)).slice(before).find((m) => m.to.includes('slow.reader@example.test'))!;
    const token = linkToken(mail, '/verify-email?token=');
    await expire('email-verification', 'slow.reader@example.test');
    const res = await t.http.post('/api/auth/verify-email').send({ token });
    expect(res.status).toBe(400);
    expect(res.body.fields.token).toBeDefined();
    expect((await agent.get('/api/auth/me')).body.user.emailVerified).toBe(false);
  });
});

describe('rate limits on sign-up, password reset and invitations', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ throttleLimit: 2, throttleTtlMs: 60_000 });
  });
  afterAll(() => t.close());

  it('answers 429 to the third sign-up in the window', async () => {
    const codes: number[] = [];
    for (const n of [1, 2, 3]) {
      codes.push((await t.http.post('/api/auth/sign-up').send({ email: `burst${n}@example.test`, password: 'a long password here', displayName: `Burst ${n}` })).status);
    }
    expect(codes).toEqual([201, 201, 429]);
    expect((await t.http.post('/api/auth/sign-in').send({ email: 'burst3@example.test', password: 'a long password here' })).status).toBe(401);
  });

  it('answers 429 to the third password-reset request in the window', async () => {
    const codes: number[] = [];
    for (let i = 0; i < 3; i++) codes.push((await t.http.post('/api/auth/request-password-reset').send({ email: 'racer2@fuelwright.test' })).status);
    expect(codes).toEqual([202, 202, 429]);
  });

  it('answers 429 to the third invitation in the window', async () => {
    const racer = await signedIn(t, demoUser('racer'));
    const kartId = (await racer.get('/api/karts')).body.karts[0].id;
    const codes: number[] = [];
    for (const n of [1, 2, 3]) codes.push((await racer.post('/api/shares').send({ scope: 'kart', kartId, email: `helper${n}@example.test`, as: 'coach' })).status);
    expect(codes).toEqual([201, 201, 429]);
    const listed = (await racer.get(`/api/shares?kartId=${kartId}`)).body.shares.map((x: { inviteeEmail: string }) => x.inviteeEmail);
    expect(listed).not.toContain('helper3@example.test');
  });
});

describe('a kart shared with a coach', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
  });
  afterAll(() => t.close());

  it('lets the coach view the kart and every case on it, change nothing, and loses access at once when revoked', async () => {
    const [kart, otherKart] = (await racer.get('/api/karts')).body.karts;
    const c = (await racer.post('/api/cases').send({ kartId: kart.id, symptoms: ['bog-on-acceleration'] })).body;
    const elsewhere = (await racer.post('/api/cases').send({ kartId: otherKart.id, symptoms: ['hesitation'] })).body;
    expect((await coach.get(`/api/karts/${kart.id}`)).status).toBe(404);
    const share = await racer.post('/api/shares').send({ scope: 'kart', kartId: kart.id, email: 'coach@fuelwright.test', as: 'coach' });
    const mail = (await flushMail(t)).find((m) => m.to.includes('coach@fuelwright.test'))!;
    const accepted = await coach.post('/api/invitations/accept').send({ token: linkToken(mail, '/invitations/') });
    expect(accepted.body).toMatchObject({ caseId: null, kartId: kart.id });

    expect((await coach.get(`/api/karts/${kart.id}`)).body.name).toBe(kart.name);
    expect((await coach.get(`/api/karts/${kart.id}/setups`)).status).toBe(200);
    expect((await coach.get(`/api/cases/${c.id}`)).status).toBe(200);
    // A case opened after the share is covered too; a case on another kart is not.
    const later = (await racer.post('/api/cases').send({ kartId: kart.id, symptoms: ['sporadic-running'] })).body;
    expect((await coach.get(`/api/cases/${later.id}`)).status).toBe(200);
    expect((await coach.get(`/api/cases/${elsewhere.id}`)).status).toBe(404);
    const dashboard = ((await coach.get('/api/shared-cases')).body.cases as { id: string }[]).map((x) => x.id);
    expect(dashboard).toEqual(expect.arrayContaining([c.id, later.id]));
    expect(dashboard).not.toContain(elsewhere.id);
    expect((await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'Seen it' })).status).toBe(201);

    // Read-only: the kart and the cases' facts stay the racer's.
    expect((await coach.patch(`/api/karts/${kart.id}`).send({ name: 'Renamed by coach' })).status).toBe(404);
    expect((await coach.delete(`/api/karts/${kart.id}`)).status).toBe(404);
    expect((await coach.post(`/api/cases/${c.id}/results`).send({ checkId: c.rank.plan[0].checkId, result: 'looks-fine' })).status).toBe(404);
    expect((await coach.post(`/api/cases/${c.id}/abandon`).send({})).status).toBe(404);
    expect((await coach.post('/api/shares').send({ scope: 'kart', kartId: kart.id, email: 'shop@fuelwright.test', as: 'shop' })).status).toBe(400);
    expect((await racer.get(`/api/karts/${kart.id}`)).body.name).toBe(kart.name);
    expect((await racer.get(`/api/cases/${c.id}`)).body.state).toBe('open');

    expect((await racer.delete(`/api/shares/${share.body.id}`)).body.status).toBe('revoked');
    expect((await coach.get(`/api/karts/${kart.id}`)).status).toBe(404);
    expect((await coach.get(`/api/cases/${c.id}`)).status).toBe(404);
    expect((await coach.get(`/api/cases/${later.id}/comments`)).status).toBe(404);
    expect((await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'Still here?' })).status).toBe(404);
    expect(((await coach.get('/api/shared-cases')).body.cases as { id: string }[]).map((x) => x.id)).not.toContain(c.id);
  });
});
