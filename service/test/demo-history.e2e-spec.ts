import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outbox, outcomes } from '@fuelwright/db';
import type { CaseDto, CaseSummaryDto, WorkOrderDto } from '@fuelwright/shared';
import { createApp } from '../src/app.factory.js';
import { DemoHistory } from '../src/demo/demo-history.js';
import { MailService } from '../src/mail/mail.service.js';
import { createTestApp, demoUser, flushMail, signedIn, type TestApp } from './test-app.js';

// The demo history is invented product data (service/src/demo/demo-history.data.ts); these checks
// are of what the app stores and shows, not of any trade fact.
describe('the demo history, on a fresh copy of the demo club', () => {
  let t: TestApp;
  let wrote: boolean;

  beforeAll(async () => {
    t = await createTestApp();
    wrote = await t.app.get(DemoHistory).run();
  });
  afterAll(() => t.close());

  it('gives the demo racer two cases: one resolved on "Blue 27", one open on "Practice chassis"', async () => {
    expect(wrote).toBe(true);
    const racer = await signedIn(t, demoUser('racer'));
    const list: CaseSummaryDto[] = (await racer.get('/api/cases')).body.cases;
    expect(list.map((c) => [c.kartName, c.state]).sort()).toEqual([
      ['Blue 27', 'resolved'],
      ['Practice chassis', 'open'],
    ]);
    const resolved: CaseDto = (await racer.get(`/api/cases/${list.find((c) => c.state === 'resolved')!.id}`)).body;
    expect(resolved.symptoms.map((s) => s.id)).toEqual(['bog-on-acceleration', 'hesitation']);
    expect(resolved.results.map((r) => [r.checkId, r.result])).toEqual([
      ['vent-lines-look', 'looks-fine'],
      ['foam-inspect', 'fault-found'],
    ]);
    expect(resolved.events.at(-1)).toMatchObject({ type: 'resolved' });
  });

  it('shows the open case on the coach’s shared cases, with the coach’s comment and photo request', async () => {
    const coach = await signedIn(t, demoUser('coach'));
    const dash = (await coach.get('/api/shared-cases')).body.cases as { id: string; kartName: string; comments: number }[];
    expect(dash.map((c) => c.kartName)).toEqual(['Practice chassis']);
    expect(dash[0].comments).toBe(1);
    const thread = (await coach.get(`/api/cases/${dash[0].id}/comments`)).body.comments;
    expect(thread).toEqual([expect.objectContaining({ authorName: 'Marit Quayle', authorRole: 'coach', body: expect.stringMatching(/photo of it/) })]);
    const photos = (await coach.get(`/api/cases/${dash[0].id}/photo-requests`)).body;
    expect(JSON.stringify(photos)).toContain('plug-reads-rich');
  });

  it('has the shop’s outcome on the resolved case, and queued no mail', async () => {
    const shop = await signedIn(t, demoUser('shop'));
    const shared = (await shop.get('/api/shared-cases')).body.cases as { id: string; kartName: string }[];
    expect(shared.map((c) => c.kartName).sort()).toEqual(['Blue 27', 'Yellow 8']);
    const logged = (await shop.get(`/api/cases/${shared.find((c) => c.kartName === 'Blue 27')!.id}/outcomes`)).body.outcomes;
    expect(logged).toEqual([expect.objectContaining({ confirmedCauses: ['foam-degraded'], loggedByName: 'Gearpit Workshop (invented)' })]);
    expect(await t.db.db.select().from(outbox)).toEqual([]);
    expect(await flushMail(t)).toEqual([]);
  });

  it('gives the shop two work orders: the second racer’s shared kart open, a walk-in done with its outcome', async () => {
    const shop = await signedIn(t, demoUser('shop'));
    const orders: WorkOrderDto[] = (await shop.get('/api/work-orders')).body.workOrders;
    expect(orders.map((w) => [w.customerName, w.kartDescription, w.status, w.outcomes]).sort()).toEqual([
      ['Oskar Brannick', 'Yellow 8', 'open', 0],
      ['Walk-in customer (invented)', '100 cc direct-drive, float-valve', 'done', 1],
    ]);
    const open = orders.find((w) => w.status === 'open')!;
    const racer2Cases: CaseSummaryDto[] = (await (await signedIn(t, demoUser('racer2'))).get('/api/cases')).body.cases;
    expect(racer2Cases.map((c) => [c.id, c.kartName, c.state])).toEqual([[open.caseId, 'Yellow 8', 'open']]);
    expect(open.symptoms.map((s) => s.id)).toEqual(['fades-after-laps', 'cuts-out-in-corners']);
    expect(open.notes).toMatch(/float valve/);
    const done = orders.find((w) => w.status === 'done')!;
    expect(done.caseId).toBeNull();
    expect(done.symptoms.map((s) => s.id)).toEqual(['slow-deceleration', 'high-idle']);
    expect(done.setup).toEqual({ carburettorKind: 'float-valve' });
    const all = (await shop.get('/api/outcomes')).body.outcomes as { workOrderId: string | null; confirmedCauses: string[]; fix: string; labourMinutes: number | null }[];
    expect(all.filter((o) => o.workOrderId === done.id)).toEqual([
      expect.objectContaining({ confirmedCauses: ['idle-screw-set'], fix: expect.stringMatching(/^Idle screw found set in two turns, backed off/), labourMinutes: 15 }),
    ]);
  });

  it('writes nothing the second time', async () => {
    expect(await t.app.get(DemoHistory).run()).toBe(false);
    const racer = await signedIn(t, demoUser('racer'));
    expect((await racer.get('/api/cases')).body.cases).toHaveLength(2);
    expect((await (await signedIn(t, demoUser('coach'))).get('/api/shared-cases')).body.cases).toHaveLength(1);
    expect(await t.db.db.select().from(outcomes)).toHaveLength(2);
    expect((await (await signedIn(t, demoUser('shop'))).get('/api/work-orders')).body.workOrders).toHaveLength(2);
  });
});

describe('the HTTP tests’ template', () => {
  it('has no demo history (only a start that seeds an empty database adds it)', async () => {
    const t = await createTestApp();
    try {
      const racer = await signedIn(t, demoUser('racer'));
      expect((await racer.get('/api/cases')).body.cases).toEqual([]);
    } finally {
      await t.close();
    }
  });
});

describe('a start on an empty database with the demo on', () => {
  // Migrating a PGlite on disk from scratch is slow on a busy machine.
  it('seeds the club and writes its history, and no demo message reaches the mail capture', { timeout: 180_000 }, async () => {
    const dataDir = mkdtempSync(join(tmpdir(), 'fw-demo-start-'));
    const app = await createApp({
      logger: false,
      config: {
        sessionSecret: 'test-secret-that-is-long-enough-0123456789',
        uiDist: '/nonexistent',
        dataDir,
        databaseUrl: undefined,
        seedDemo: true,
        // A live sender that sends as soon as a message is queued, as in a real start.
        mailPollMs: 60_000,
        mailCapturePort: 0,
        smtpUrl: undefined,
        publicUrl: 'http://fuelwright.test',
        s3Endpoint: undefined,
        objectsDir: join(dataDir, 'objects'),
      },
    });
    try {
      await app.init();
      const mail = app.get(MailService);
      await mail.flush();
      expect(mail.capture!.received).toEqual([]);
      const racer = request.agent(app.getHttpServer());
      expect((await racer.post('/api/auth/sign-in').send(demoUser('racer'))).status).toBe(200);
      expect((await racer.get('/api/cases')).body.cases).toHaveLength(2);
    } finally {
      await app.close();
      rmSync(dataDir, { recursive: true, force: true });
    }
  });
});
