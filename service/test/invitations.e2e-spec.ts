import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, demoUser, flushMail, linkToken, signedIn, type TestApp } from './test-app.js';

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
    await racer.post('/api/shares').send({ scope: 'kart', kartId, email: 'coach@fuelwright.test', as: 'coach' });
    const invite = (await flushMail(t)).find((m) => m.to.includes('coach@fuelwright.test'))!;
    expect((await coach.post('/api/invitations/accept').send({ token: linkToken(invite, '/invitations/') })).status).toBe(200);
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
