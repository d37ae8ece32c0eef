import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
