import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { outbox } from '@fuelwright/db';
import { ConfigService } from '@nestjs/config';
import { MAX_ATTEMPTS } from '../src/mail/retry-schedule.js';
import { MailService } from '../src/mail/mail.service.js';
import { MailCaptureServer } from '../src/mail/mail-capture.server.js';
import { createTestApp, demoUser, flushMail, signedIn, type TestApp } from './test-app.js';

describe('the admin outbox with the local mail capture (development, tests)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('shows the messages with their links whole, so development can follow them', async () => {
    await t.http.post('/api/auth/request-password-reset').send({ email: 'racer2@fuelwright.test' });
    const captured = (await flushMail(t)).find((m) => m.to.includes('racer2@fuelwright.test'))!;
    const link = /http:\/\/fuelwright\.test\/reset-password\?token=[A-Za-z0-9_-]+/.exec(captured.text)![0];
    const admin = await signedIn(t, demoUser('admin'));
    const res = await admin.get('/api/admin/outbox');
    expect(res.status).toBe(200);
    expect(res.body.capturing).toBe(true);
    const reset = res.body.messages.find((m: { kind: string }) => m.kind === 'password-reset');
    expect(reset.text).toContain(link);
    expect((await (await signedIn(t, demoUser('coach'))).get('/api/admin/outbox')).status).toBe(403);
  });
});

describe('a message that failed for good', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('is marked failed after its last try, and the admin can queue it again', async () => {
    const mail = t.app.get(MailService);
    await t.http.post('/api/auth/request-password-reset').send({ email: 'racer2@fuelwright.test' });
    const [queued] = await t.db.db.select().from(outbox).where(eq(outbox.kind, 'password-reset'));
    // As if it had already been tried all day: the next failure is the last.
    await t.db.db.update(outbox).set({ attempts: MAX_ATTEMPTS - 1 }).where(eq(outbox.id, queued.id));
    mail.capture!.failNext = 1;
    await mail.flush();
    const row = async () => (await t.db.db.select().from(outbox).where(eq(outbox.id, queued.id)))[0];
    expect(await row()).toMatchObject({ status: 'failed', attempts: MAX_ATTEMPTS });
    // Failed means no more tries, however often the sender looks.
    await t.db.db.update(outbox).set({ nextAttemptAt: new Date(Date.now() - 1000) }).where(eq(outbox.id, queued.id));
    expect(await mail.flush()).toBe(0);

    const admin = await signedIn(t, demoUser('admin'));
    const coach = await signedIn(t, demoUser('coach'));
    expect((await coach.post(`/api/admin/outbox/${queued.id}/retry`)).status).toBe(403);
    const res = await admin.post(`/api/admin/outbox/${queued.id}/retry`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: queued.id, status: 'pending' });
    expect(await row()).toMatchObject({ status: 'pending', attempts: 0 });
    expect(await mail.flush()).toBe(1);
    expect(await row()).toMatchObject({ status: 'sent', attempts: 1 });
    expect(mail.capture!.received.filter((m) => m.to.includes('racer2@fuelwright.test'))).toHaveLength(1);

    const again = await admin.post(`/api/admin/outbox/${queued.id}/retry`);
    expect(again.status).toBe(409);
    expect(again.body.message).toMatch(/sent/);
    expect((await admin.post('/api/admin/outbox/00000000-0000-4000-8000-000000000000/retry')).status).toBe(404);
    expect((await admin.post('/api/admin/outbox/not-an-id/retry')).status).toBe(404);
  });
});

describe('two app instances sending from one database', () => {
  let t: TestApp;
  let a: MailService;
  let b: MailService;
  beforeAll(async () => {
    t = await createTestApp();
    a = t.app.get(MailService);
    // A second sender on the same database, with its own mailbox, as a second app instance would be.
    b = new MailService(t.db.db, t.app.get(ConfigService));
    await b.onApplicationBootstrap();
  });
  afterAll(async () => {
    await b.onApplicationShutdown();
    await t.close();
  });

  const queue = async (n: number, tag: string) => {
    for (let i = 0; i < n; i++) {
      await a.enqueue(t.db.db, { kind: 'password-reset', toEmail: `${tag}${i}@example.test`, content: { subject: `${tag} ${i}`, paragraphs: ['x'] } });
    }
  };
  const subjects = (tag: string) => [...a.capture!.received, ...b.capture!.received].map((m) => m.subject).filter((s) => s.startsWith(`${tag} `));

  it('sends each message once when both flush at the same time', async () => {
    await queue(25, 'together');
    const [sentA, sentB] = await Promise.all([a.flush(), b.flush()]);
    expect(sentA + sentB).toBe(25);
    const got = subjects('together');
    expect(got).toHaveLength(25);
    expect(new Set(got).size).toBe(25);
    expect((await t.db.db.select().from(outbox).where(eq(outbox.status, 'pending'))).length).toBe(0);
  });

  it('leaves a message claimed by a live sender alone, and takes over one whose sender died', async () => {
    await queue(2, 'leased');
    const rows = (await t.db.db.select().from(outbox).where(eq(outbox.status, 'pending'))).sort((x, y) => x.toEmail.localeCompare(y.toEmail));
    expect(rows).toHaveLength(2);
    // One claimed a minute ago by a sender still within its lease, one by a sender whose lease ran out.
    await t.db.db.update(outbox).set({ lockedUntil: new Date(Date.now() + 9 * 60_000) }).where(eq(outbox.id, rows[0].id));
    await t.db.db.update(outbox).set({ lockedUntil: new Date(Date.now() - 1000) }).where(eq(outbox.id, rows[1].id));
    expect(await b.flush()).toBe(1);
    expect(subjects('leased')).toEqual(['leased 1']);
    const after = async (id: string) => (await t.db.db.select().from(outbox).where(eq(outbox.id, id)))[0];
    expect(await after(rows[0].id)).toMatchObject({ status: 'pending', attempts: 0 });
    expect(await after(rows[1].id)).toMatchObject({ status: 'sent', attempts: 1, lockedUntil: null });
  });
});

describe('the admin outbox with a real mail service configured', () => {
  let t: TestApp;
  const inbox = new MailCaptureServer();
  beforeAll(async () => {
    const port = await inbox.start(0);
    t = await createTestApp({ smtpUrl: `smtp://127.0.0.1:${port}` });
  });
  afterAll(async () => {
    await t.close();
    await inbox.stop();
  });

  it('is not served (404), while the mail still goes out', async () => {
    expect(t.app.get(MailService).capture).toBeUndefined();
    const admin = await signedIn(t, demoUser('admin'));
    const res = await admin.get('/api/admin/outbox');
    expect(res.status).toBe(404);
    expect(JSON.stringify(res.body)).not.toMatch(/reset-password|invitations\//);
    await t.http.post('/api/auth/request-password-reset').send({ email: 'racer2@fuelwright.test' });
    expect((await admin.post('/api/admin/outbox/flush')).body).toEqual({ sent: 1 });
    expect(inbox.received.map((m) => m.to)).toEqual([['racer2@fuelwright.test']]);
  });
});
