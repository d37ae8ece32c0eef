import 'reflect-metadata';
import { readFileSync } from 'node:fs';
import { inject } from 'vitest';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { openDatabase, readDemoFixture, type DatabaseHandle } from '@fuelwright/db';
import { createApp } from '../src/app.factory.js';
import type { AppConfig } from '../src/config/app.config.js';

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
  const db = await cloneTemplateDatabase();
  const app = await createApp({
    logger: false,
    database: db,
    config: { sessionSecret: 'test-secret-that-is-long-enough-0123456789', uiDist: '/nonexistent', seedDemo: false, ...config },
  });
  await app.init();
  return { app, db, http: request(app.getHttpServer()), close: () => app.close() };
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
