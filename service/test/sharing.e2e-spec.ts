import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { outbox } from '@fuelwright/db';
import type { CaseDto } from '@fuelwright/shared';
import { MailService } from '../src/mail/mail.service.js';
import { createTestApp, demoUser, flushMail, linkToken, shareAndAccept, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

describe('sharing a case with a coach', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  let shop: Agent;
  let c: CaseDto;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
    shop = await signedIn(t, demoUser('shop'));
    const kartId = (await racer.get('/api/karts')).body.karts.find((k: { name: string }) => k.name === 'Blue 27').id;
    c = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration', 'sporadic-running'] })).body;
  });
  afterAll(() => t.close());

  it('gives the coach nothing before the invitation is accepted', async () => {
    expect((await coach.get(`/api/cases/${c.id}`)).status).toBe(404);
    expect((await coach.get(`/api/cases/${c.id}/comments`)).status).toBe(404);
  });

  it('answers the same whether or not the invitee has an account, and e-mails a single-use link', async () => {
    const known = await racer.post('/api/shares').send({ scope: 'case', caseId: c.id, email: 'coach@fuelwright.test', as: 'coach' });
    const unknown = await racer.post('/api/shares').send({ scope: 'case', caseId: c.id, email: 'new.coach@example.test', as: 'coach' });
    expect(known.status).toBe(201);
    expect(unknown.status).toBe(201);
    expect(known.body.status).toBe('invited');
    expect(unknown.body.status).toBe('invited');
    expect(Object.keys(known.body).sort()).toEqual(Object.keys(unknown.body).sort());
    const mails = await flushMail(t);
    const toCoach = mails.filter((m) => m.to.includes('coach@fuelwright.test'));
    expect(toCoach).toHaveLength(1);
    expect(toCoach[0].subject).toMatch(/Tamsin Vell shared a case/);
    expect(toCoach[0].html).toMatch(/<a href="http:\/\/fuelwright.test\/invitations\//);
  });

  it('lets the coach accept once; the case then opens for the coach, read-only', async () => {
    const mail = (await flushMail(t)).find((m) => m.to.includes('coach@fuelwright.test'))!;
    const token = linkToken(mail, '/invitations/');
    // Only the invited address may accept: the shop holding a forwarded link gets a named 400 and
    // the link stays usable for the coach.
    const forwarded = await shop.post('/api/invitations/accept').send({ token });
    expect(forwarded.status).toBe(400);
    expect(forwarded.body.fields.token[0]).toMatch(/sent to coach@fuelwright.test/);
    expect((await shop.get(`/api/cases/${c.id}`)).status).toBe(404);
    const accepted = await coach.post('/api/invitations/accept').send({ token });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ caseId: c.id, share: { status: 'active', granteeName: 'Marit Quayle' } });
    expect((await coach.post('/api/invitations/accept').send({ token })).status).toBe(400);
    const seen = await coach.get(`/api/cases/${c.id}`);
    expect(seen.status).toBe(200);
    expect(seen.body.id).toBe(c.id);
    // Read-only for the facts: the coach cannot record results, resolve or abandon.
    expect((await coach.post(`/api/cases/${c.id}/results`).send({ checkId: c.rank.plan[0].checkId, result: 'looks-fine' })).status).toBe(404);
    expect((await coach.post(`/api/cases/${c.id}/resolve`).send({ causeId: 'foam-degraded', fix: 'x' })).status).toBe(404);
    const dashboard = (await coach.get('/api/shared-cases')).body.cases;
    expect(dashboard.map((x: { id: string }) => x.id)).toContain(c.id);
    // The shop was not invited: still nothing.
    expect((await shop.get(`/api/cases/${c.id}`)).status).toBe(404);
    expect((await shop.get('/api/shared-cases')).body.cases).toEqual([]);
  });

  it('carries comments both ways, as plain text, with an e-mail to the other side', async () => {
    const before = (await flushMail(t)).length;
    const res = await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'Is the foam <b>crumbling</b>?' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ authorName: 'Marit Quayle', authorRole: 'coach', body: 'Is the foam <b>crumbling</b>?' });
    await racer.post(`/api/cases/${c.id}/comments`).send({ body: 'Yes, it is brown and soft.' });
    const dash = (await coach.get('/api/shared-cases')).body.cases.find((x: { id: string }) => x.id === c.id);
    expect(dash.comments).toBe(2);
    const thread = (await racer.get(`/api/cases/${c.id}/comments`)).body.comments;
    expect(thread.map((x: { body: string }) => x.body)).toEqual(['Is the foam <b>crumbling</b>?', 'Yes, it is brown and soft.']);
    const mails = (await flushMail(t)).slice(before);
    const toRacer = mails.find((m) => m.to.includes('racer@fuelwright.test'))!;
    expect(toRacer.subject).toMatch(/Marit Quayle commented/);
    expect(toRacer.html).toContain('&lt;b&gt;crumbling&lt;/b&gt;');
    expect(toRacer.html).not.toContain('<b>crumbling</b>');
    expect(toRacer.text).toMatch(/Stop these e-mails: http:\/\/fuelwright.test\/unsubscribe\?token=/);
    expect(mails.find((m) => m.to.includes('coach@fuelwright.test'))!.subject).toMatch(/Tamsin Vell commented/);
    const long = await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'x'.repeat(2001) });
    expect(long.status).toBe(400);
    expect(long.body.fields.body[0]).toMatch(/at most 2000/);
  });

  it('puts a recommended check at the top of the racer’s plan, marked as the coach’s', async () => {
    const last = c.rank.plan.at(-1)!.checkId;
    const res = await coach.post(`/api/cases/${c.id}/recommendations`).send({ checkId: last, reason: 'Look at the foam first' });
    expect(res.status).toBe(200);
    const seen: CaseDto = (await racer.get(`/api/cases/${c.id}`)).body;
    expect(seen.rank.plan[0]).toMatchObject({ checkId: last, recommendation: { byName: 'Marit Quayle', reason: 'Look at the foam first' } });
    expect(seen.recommendations).toEqual([expect.objectContaining({ checkId: last, pending: true })]);
    expect(seen.events.at(-1)).toMatchObject({ type: 'check-recommended', actorName: 'Marit Quayle' });
    expect((await coach.post(`/api/cases/${c.id}/recommendations`).send({ checkId: 'no-such-check', reason: 'x' })).status).toBe(400);
    const mails = await flushMail(t);
    expect(mails.some((m) => m.to.includes('racer@fuelwright.test') && /recommends a check/.test(m.subject))).toBe(true);
    // Once the racer records it, it is no longer pending and leaves the top.
    const after: CaseDto = (await racer.post(`/api/cases/${c.id}/results`).send({ checkId: last, result: 'looks-fine' })).body;
    expect(after.recommendations[0].pending).toBe(false);
    expect(after.rank.plan.some((p) => p.checkId === last)).toBe(false);
  });

  it('lets the coach ask for a photo; the racer is e-mailed', async () => {
    const res = await coach.post(`/api/cases/${c.id}/photo-requests`).send({ what: 'The foam blocks, out of the bowl' });
    expect(res.status).toBe(201);
    expect((await racer.get(`/api/cases/${c.id}/photo-requests`)).body.requests).toHaveLength(1);
    expect((await racer.post(`/api/cases/${c.id}/photo-requests`).send({ what: 'myself' })).status).toBe(400);
    const mails = await flushMail(t);
    expect(mails.some((m) => m.to.includes('racer@fuelwright.test') && /asks for a photo/.test(m.subject))).toBe(true);
  });

  it('revoking ends the coach’s access at once', async () => {
    const list = (await racer.get(`/api/shares?caseId=${c.id}`)).body.shares;
    const active = list.find((s: { status: string }) => s.status === 'active');
    expect((await racer.delete(`/api/shares/${active.id}`)).body.status).toBe('revoked');
    expect((await coach.get(`/api/cases/${c.id}`)).status).toBe(404);
    expect((await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'still here?' })).status).toBe(404);
    expect((await coach.get('/api/shared-cases')).body.cases.map((x: { id: string }) => x.id)).not.toContain(c.id);
    // Only the owner can revoke.
    expect((await coach.delete(`/api/shares/${active.id}`)).status).toBe(404);
  });

  it('an invitee without an account signs up through the link as a racer account and reviews the case end to end', async () => {
    const mail = (await flushMail(t)).find((m) => m.to.includes('new.coach@example.test'))!;
    const token = linkToken(mail, '/invitations/');
    const agent = request.agent(t.app.getHttpServer());
    const wrong = await agent.post('/api/auth/sign-up').send({ email: 'other@example.test', password: 'a long password here', displayName: 'Other', invitationToken: token });
    expect(wrong.status).toBe(400);
    expect(wrong.body.fields.email[0]).toMatch(/new.coach@example.test/);
    const res = await agent.post('/api/auth/sign-up').send({ email: 'new.coach@example.test', password: 'a long password here', displayName: 'New Coach', invitationToken: token });
    expect(res.status).toBe(201);
    // Every new account is a racer account (only an admin changes roles); the share lets it review.
    expect(res.body.user).toMatchObject({ role: 'racer', emailVerified: true });
    // What was shared, for the page to open next.
    expect(res.body.shared).toEqual({ caseId: c.id, kartId: c.kartId });
    const seen: CaseDto = (await agent.get(`/api/cases/${c.id}`)).body;
    expect(seen.id).toBe(c.id);
    expect((await agent.get('/api/shared-cases')).body.cases.map((x: { id: string }) => x.id)).toEqual([c.id]);
    const comment = await agent.post(`/api/cases/${c.id}/comments`).send({ body: 'Send me the plug colour too' });
    expect(comment.status).toBe(201);
    // Beside their name, the part they play on this case (shared with them as coach), not their account role.
    expect(comment.body).toMatchObject({ authorName: 'New Coach', authorRole: 'coach' });
    const ownerSays = await racer.post(`/api/cases/${c.id}/comments`).send({ body: 'Plug is tan' });
    const thread = (await agent.get(`/api/cases/${c.id}/comments`)).body;
    const list: { authorName: string; authorRole: string }[] = thread.comments ?? thread;
    expect(list.find((x) => x.authorName === 'New Coach')?.authorRole).toBe('coach');
    expect(list.find((x) => x.authorName === ownerSays.body.authorName)?.authorRole).toBe('racer');
    const check = seen.rank.plan.at(-1)!.checkId;
    const recommended = await agent.post(`/api/cases/${c.id}/recommendations`).send({ checkId: check, reason: 'Rule this out first' });
    expect(recommended.status).toBe(200);
    expect(recommended.body.rank.plan[0]).toMatchObject({ checkId: check, recommendation: { byName: 'New Coach' } });
    expect((await agent.post(`/api/cases/${c.id}/photo-requests`).send({ what: 'The plug, out of the head' })).status).toBe(201);
    // Still read-only for the facts.
    expect((await agent.post(`/api/cases/${c.id}/results`).send({ checkId: check, result: 'looks-fine' })).status).toBe(404);
  });

  it('a racer cannot invite a second address of their own into a shop account', async () => {
    const invite = await racer.post('/api/shares').send({ scope: 'case', caseId: c.id, email: 'my.other.address@example.test', as: 'shop' });
    expect(invite.status).toBe(201);
    const mail = (await flushMail(t)).find((m) => m.to.includes('my.other.address@example.test'))!;
    const alt = request.agent(t.app.getHttpServer());
    const res = await alt
      .post('/api/auth/sign-up')
      .send({ email: 'my.other.address@example.test', password: 'a long password here', displayName: 'Alt', invitationToken: linkToken(mail, '/invitations/') });
    expect(res.status).toBe(201);
    expect(res.body.user.role).toBe('racer');
    expect((await alt.get('/api/auth/me')).body.user.role).toBe('racer');
    // None of the shop's powers: insights, work orders, the outcome list, rulesets and refinement.
    expect((await alt.get('/api/insights')).status).toBe(403);
    expect((await alt.get('/api/work-orders')).status).toBe(403);
    expect((await alt.get('/api/outcomes')).status).toBe(403);
    expect((await alt.post('/api/rulesets/proposals').send({})).status).toBe(403);
    // The share itself works, labelled as the racer chose.
    expect((await alt.get(`/api/cases/${c.id}`)).status).toBe(200);
    const share = (await racer.get(`/api/shares?caseId=${c.id}`)).body.shares.find((x: { inviteeEmail: string }) => x.inviteeEmail === 'my.other.address@example.test');
    expect(share).toMatchObject({ as: 'shop', status: 'active' });
  });

  it('refuses bad share requests, naming the field', async () => {
    const res = await racer.post('/api/shares').send({ scope: 'case', email: 'nope', as: 'friend' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['as', 'caseId', 'email']);
    const self = await racer.post('/api/shares').send({ scope: 'case', caseId: c.id, email: 'racer@fuelwright.test', as: 'coach' });
    expect(self.body.fields.email[0]).toMatch(/your own address/);
    const racer2 = await signedIn(t, demoUser('racer2'));
    const notMine = await racer2.post('/api/shares').send({ scope: 'case', caseId: c.id, email: 'coach@fuelwright.test', as: 'coach' });
    expect(notMine.body.fields.caseId).toBeDefined();
  });
});

describe('e-mail delivery, settings and account links', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('retries a failed send and never loses the comment that caused it', async () => {
    const racer = await signedIn(t, demoUser('racer'));
    const coach = await signedIn(t, demoUser('coach'));
    const kartId = (await racer.get('/api/karts')).body.karts[0].id;
    const c = (await racer.post('/api/cases').send({ kartId, symptoms: ['hesitation'] })).body;
    await shareAndAccept(t, racer, coach, 'coach@fuelwright.test', { scope: 'kart', kartId });
    const mail = t.app.get(MailService);
    mail.capture!.failNext = 1;
    expect((await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'Check the vent lines' })).status).toBe(201);
    await mail.flush();
    const [queued] = await t.db.db.select().from(outbox).where(eq(outbox.kind, 'comment'));
    expect(queued).toMatchObject({ status: 'pending', attempts: 1 });
    expect(queued.lastError).toMatch(/451|unavailable/i);
    expect((await racer.get(`/api/cases/${c.id}/comments`)).body.comments).toHaveLength(1);
    // Not sent again before its backoff ...
    await mail.flush();
    expect((await t.db.db.select().from(outbox).where(eq(outbox.id, queued.id)))[0].attempts).toBe(1);
    // ... and sent once it is due.
    await t.db.db.update(outbox).set({ nextAttemptAt: new Date(Date.now() - 1000) }).where(eq(outbox.id, queued.id));
    await mail.flush();
    expect((await t.db.db.select().from(outbox).where(eq(outbox.id, queued.id)))[0]).toMatchObject({ status: 'sent', attempts: 2 });
  });

  it('honours the per-user setting and the unsubscribe link of each kind of notice', async () => {
    const racer = await signedIn(t, demoUser('racer'));
    const coach = await signedIn(t, demoUser('coach'));
    const c = (await racer.get('/api/cases')).body.cases[0];
    const before = (await flushMail(t)).length;
    await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'One' });
    const notice = (await flushMail(t)).slice(before).find((m) => m.to.includes('racer@fuelwright.test'))!;
    const token = decodeURIComponent(linkToken(notice, '/unsubscribe?token='));
    const unsub = await t.http.post('/api/notifications/unsubscribe').send({ token });
    expect(unsub.body).toEqual({ kind: 'comment' });
    expect((await racer.get('/api/me/notifications')).body.notices).toEqual({ comment: false });
    const count = (await flushMail(t)).length;
    await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'Two' });
    expect((await flushMail(t)).length).toBe(count);
    await racer.put('/api/me/notifications').send({ comment: true });
    await coach.post(`/api/cases/${c.id}/comments`).send({ body: 'Three' });
    expect((await flushMail(t)).length).toBe(count + 1);
    expect((await t.http.post('/api/notifications/unsubscribe').send({ token: token.slice(0, -2) + 'xx' })).status).toBe(400);
    expect((await racer.put('/api/me/notifications').send({ comment: 'no' })).body.fields.comment).toBeDefined();
  });

  it('tells the coach when a shared case is resolved', async () => {
    const racer = await signedIn(t, demoUser('racer'));
    const open = (await racer.get('/api/cases?state=open')).body.cases[0];
    const before = (await flushMail(t)).length;
    expect((await racer.post(`/api/cases/${open.id}/resolve`).send({ causeId: 'vent-lines-off', fix: 'Refitted the vent lines, routed up' })).status).toBe(200);
    const mails = (await flushMail(t)).slice(before);
    const toCoach = mails.find((m) => m.to.includes('coach@fuelwright.test'))!;
    expect(toCoach.subject).toMatch(/Case resolved/);
    expect(toCoach.text).toMatch(/Refitted the vent lines/);
    expect(mails.some((m) => m.to.includes('racer@fuelwright.test'))).toBe(false);
  });

  it('verifies a new account’s e-mail through a single-use link', async () => {
    const agent = request.agent(t.app.getHttpServer());
    const res = await agent.post('/api/auth/sign-up').send({ email: 'fresh@example.test', password: 'a long password here', displayName: 'Fresh' });
    expect(res.body.user.emailVerified).toBe(false);
    const mail = (await flushMail(t)).find((m) => m.to.includes('fresh@example.test'))!;
    const token = linkToken(mail, '/verify-email?token=');
    expect((await t.http.post('/api/auth/verify-email').send({ token })).status).toBe(204);
    expect((await agent.get('/api/auth/me')).body.user.emailVerified).toBe(true);
    expect((await t.http.post('/api/auth/verify-email').send({ token })).status).toBe(400);
  });

  it('resets a password without telling whether an address has an account, and signs out everywhere', async () => {
    const old = await signedIn(t, demoUser('racer2'));
    const before = (await flushMail(t)).length;
    const unknown = await t.http.post('/api/auth/request-password-reset').send({ email: 'nobody@example.test' });
    const known = await t.http.post('/api/auth/request-password-reset').send({ email: 'racer2@fuelwright.test' });
    expect(unknown.status).toBe(202);
    expect(known.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    const mails = (await flushMail(t)).slice(before);
    expect(mails).toHaveLength(1);
    const token = linkToken(mails[0], '/reset-password?token=');
    expect((await t.http.post('/api/auth/reset-password').send({ token, password: 'short' })).body.fields.password).toBeDefined();
    expect((await t.http.post('/api/auth/reset-password').send({ token, password: 'a brand new password' })).status).toBe(204);
    expect((await t.http.post('/api/auth/reset-password').send({ token, password: 'another new password' })).status).toBe(400);
    expect((await old.get('/api/auth/me')).status).toBe(401);
    expect((await t.http.post('/api/auth/sign-in').send({ email: 'racer2@fuelwright.test', password: 'a brand new password' })).status).toBe(200);
  });

  it('shows the outbox to the admin only', async () => {
    const admin = await signedIn(t, demoUser('admin'));
    const res = await admin.get('/api/admin/outbox');
    expect(res.status).toBe(200);
    expect(res.body.capturing).toBe(true);
    expect(res.body.messages.length).toBeGreaterThan(0);
    expect((await (await signedIn(t, demoUser('coach'))).get('/api/admin/outbox')).status).toBe(403);
  });
});
