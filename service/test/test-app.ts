import 'reflect-metadata';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inject } from 'vitest';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { openDatabase, readDemoFixture, type DatabaseHandle } from '@fuelwright/db';
import { createApp } from '../src/app.factory.js';
import type { AppConfig } from '../src/config/app.config.js';
import { MailService } from '../src/mail/mail.service.js';
import type { CapturedMail } from '../src/mail/mail-capture.server.js';

export interface TestApp {
  app: NestExpressApplication;
  db: DatabaseHandle;
  http: ReturnType<typeof request>;
  close(): Promise<void>;
}

/** A fresh copy of the migrated, demo-seeded template database (see global-setup.ts). */
export async function cloneTemplateDatabase(): Promise<DatabaseHandle> {
  const bytes = readFileSync(inject('pgTemplatePath'));
  return openDatabase({ loadDataDir: new Blob([bytes]) });
}

export async function createTestApp(config: Partial<AppConfig> = {}): Promise<TestApp> {
  return startTestApp(await cloneTemplateDatabase(), config);
}

/** The app on a given database, with the test configuration (no timers, a local mail capture, a temporary object store). */
export async function startTestApp(db: DatabaseHandle, config: Partial<AppConfig> = {}): Promise<TestApp> {
  const objectsDir = mkdtempSync(join(tmpdir(), 'fw-objects-'));
  const app = await createApp({
    logger: false,
    database: db,
    config: {
      sessionSecret: 'test-secret-that-is-long-enough-0123456789',
      uiDist: '/nonexistent',
      seedDemo: false,
      // Tests send the outbox themselves (flushMail) instead of a timer.
      mailPollMs: 0,
      mailCapturePort: 0,
      smtpUrl: undefined,
      publicUrl: 'http://fuelwright.test',
      s3Endpoint: undefined,
      objectsDir,
      ...config,
    },
  });
  await app.init();
  return {
    app,
    db,
    http: request(app.getHttpServer()),
    close: async () => {
      await app.close();
      rmSync(objectsDir, { recursive: true, force: true });
    },
  };
}

export const DEMO = readDemoFixture();
export const demoUser = (role: 'racer' | 'racer2' | 'coach' | 'shop' | 'admin') => ({
  email: `${role}@fuelwright.test`,
  password: DEMO.password,
});

/** Signs in and returns a supertest agent that carries the session cookie. */
export async function signedIn(t: TestApp, who: ReturnType<typeof demoUser>) {
  const agent = request.agent(t.app.getHttpServer());
  const res = await agent.post('/api/auth/sign-in').send(who);
  if (res.status !== 200) throw new Error(`sign-in as ${who.email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

/** Sends what the outbox holds and returns every message the local capture server has received. */
export async function flushMail(t: TestApp): Promise<CapturedMail[]> {
  const mail = t.app.get(MailService);
  await mail.flush();
  return mail.capture!.received;
}

/** The token in the first link of a message that matches `path` (e.g. "/invitations/"). */
export function linkToken(m: CapturedMail, path: string): string {
  const re = new RegExp(`${path.replace(/[/?]/g, (c) => `\\${c}`)}([A-Za-z0-9_-]+)`);
  const hit = re.exec(m.text);
  if (!hit) throw new Error(`no ${path} link in: ${m.text}`);
  return hit[1];
}

/**
 * The owner shares a kart or a case by e-mail with a signed-in account, which accepts the e-mailed
 * invitation. Returns what the accept answered (the shared case or kart).
 */
export async function shareAndAccept(
  t: TestApp,
  owner: ReturnType<typeof request.agent>,
  grantee: ReturnType<typeof request.agent>,
  email: string,
  target: { scope: 'kart'; kartId: string } | { scope: 'case'; caseId: string },
  as: 'coach' | 'shop' = 'coach',
): Promise<{ caseId: string | null; kartId: string }> {
  const before = (await flushMail(t)).length;
  const shared = await owner.post('/api/shares').send({ ...target, email, as });
  if (shared.status !== 201) throw new Error(`sharing with ${email} failed: ${shared.status} ${JSON.stringify(shared.body)}`);
  const invite = (await flushMail(t)).slice(before).find((m) => m.to.includes(email));
  if (!invite) throw new Error(`no invitation e-mail reached ${email}`);
  const accepted = await grantee.post('/api/invitations/accept').send({ token: linkToken(invite, '/invitations/') });
  if (accepted.status !== 200) throw new Error(`accepting as ${email} failed: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  return accepted.body;
}
