import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { proposals, users } from '@fuelwright/db';
import { SHIPPED_RULESET_VERSION } from '@fuelwright/rules';
import { PROPOSAL_LIST_LIMIT, type CaseDto, type CaseOutcomeDto, type OutcomeDto, type ProposalDto, type ProposalSummaryDto, type WorkOrderDto } from '@fuelwright/shared';
import { eq } from 'drizzle-orm';
import { generateOutcomes } from '../../fixtures/generate-outcomes.js';
import { insertOutcomeRecords } from '../src/learning/demo-outcomes.js';
import { ProposalRunner } from '../src/learning/proposal-runner.js';
import { createTestApp, demoUser, shareAndAccept, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

const nameOf = async (agent: Agent): Promise<string> => (await agent.get('/api/auth/me')).body.user.displayName;

describe('reading back outcomes, proposals and work orders', () => {
  let t: TestApp;
  let racer: Agent;
  let racer2: Agent;
  let coach: Agent;
  let shop: Agent;
  let admin: Agent;
  let c: CaseDto;
  beforeAll(async () => {
    t = await createTestApp();
    [racer, racer2, coach, shop, admin] = await Promise.all((['racer', 'racer2', 'coach', 'shop', 'admin'] as const).map((r) => signedIn(t, demoUser(r))));
    const kartId = (await racer.get('/api/karts')).body.karts.find((k: { name: string }) => k.name === 'Blue 27').id;
    const opened = await racer.post('/api/cases').send({ kartId, symptoms: ['fuel-from-vents'], setup: { ventLinesFitted: false, foamFittedDate: '2024-01-10' } });
    if (opened.status !== 201) throw new Error(`case not opened: ${opened.status} ${JSON.stringify(opened.body)}`);
    c = opened.body;
  });
  afterAll(() => t.close());

  describe('GET /api/cases/:id/outcomes', () => {
    let first: OutcomeDto;
    let correction: OutcomeDto;

    it('gives the racer what they logged on their case, newest first, the corrected entry flagged as superseded', async () => {
      expect((await racer.get(`/api/cases/${c.id}/outcomes`)).body).toEqual({ outcomes: [] });
      first = (await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['foam-degraded'], fix: 'New foam blocks', parts: 'foam set', labourMinutes: 25 })).body;
      correction = (
        await racer.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['vent-lines-off'], fix: 'Vent lines fitted, routed up', stillFixed: true, supersedesId: first.id })
      ).body;
      const res = await racer.get(`/api/cases/${c.id}/outcomes`);
      expect(res.status).toBe(200);
      const listed: CaseOutcomeDto[] = res.body.outcomes;
      expect(listed.map((o) => o.id)).toEqual([correction.id, first.id]);
      const racerName = await nameOf(racer);
      expect(listed[0]).toMatchObject({ caseId: c.id, current: true, supersedesId: first.id, confirmedCauses: ['vent-lines-off'], stillFixed: true, loggedByName: racerName, yours: true });
      expect(listed[1]).toMatchObject({ current: false, confirmedCauses: ['foam-degraded'], fix: 'New foam blocks', parts: 'foam set', labourMinutes: 25, loggedByName: racerName, yours: true });
      // The same entries as the shop/admin outcome log gives, field for field.
      const log: OutcomeDto[] = (await admin.get('/api/outcomes')).body.outcomes;
      for (const { yours: _yours, ...o } of listed) expect(o).toEqual(log.find((x) => x.id === o.id));
    });

    it('answers 404 to anyone the case is not shared with, whatever their role, and to ids that are not cases', async () => {
      for (const who of [racer2, coach, shop, admin]) expect((await who.get(`/api/cases/${c.id}/outcomes`)).status).toBe(404);
      expect((await racer.get('/api/cases/not-a-uuid/outcomes')).status).toBe(404);
      expect((await racer.get('/api/cases/00000000-0000-4000-8000-000000000000/outcomes')).status).toBe(404);
      expect((await t.http.get(`/api/cases/${c.id}/outcomes`)).status).toBe(401);
    });

    it('lets a shop the case is shared with read them and add its own; the racer then sees the shop’s entry by name', async () => {
      await shareAndAccept(t, racer, shop, 'shop@fuelwright.test', { scope: 'case', caseId: c.id }, 'shop');
      const seen = await shop.get(`/api/cases/${c.id}/outcomes`);
      expect(seen.status).toBe(200);
      // The racer's entries, which are not the shop's own.
      expect(seen.body.outcomes.map((o: CaseOutcomeDto) => [o.id, o.current, o.yours])).toEqual([
        [correction.id, true, false],
        [first.id, false, false],
      ]);
      const byShop = (await shop.post('/api/outcomes').send({ caseId: c.id, confirmedCauses: ['vent-lines-off'], fix: 'Checked the vent lines again', labourMinutes: 10 })).body;
      const listed: CaseOutcomeDto[] = (await racer.get(`/api/cases/${c.id}/outcomes`)).body.outcomes;
      expect(listed[0]).toMatchObject({ id: byShop.id, current: true, loggedByName: await nameOf(shop), yours: false });
      expect(listed.slice(1).every((o) => o.yours)).toBe(true);
      expect((await shop.get(`/api/cases/${c.id}/outcomes`)).body.outcomes[0]).toMatchObject({ id: byShop.id, yours: true });
      // Still only the case's own entries, and another racer still gets nothing.
      expect(listed.every((o) => o.caseId === c.id)).toBe(true);
      expect((await racer2.get(`/api/cases/${c.id}/outcomes`)).status).toBe(404);
    });
  });

  describe('work orders carry their setup', () => {
    it('returns the walk-in’s setup as entered, and a shared case’s setup for a work order on that case', async () => {
      const setup = { carburettorKind: 'pump-around', ventLinesFitted: false, mainJet: 120 };
      const walkIn = await shop.post('/api/work-orders').send({ customerName: 'Walk-in customer', symptoms: ['fuel-from-vents'], setup });
      expect(walkIn.status, JSON.stringify(walkIn.body)).toBe(201);
      expect((walkIn.body as WorkOrderDto).setup).toEqual(setup);
      const bare = (await shop.post('/api/work-orders').send({ customerName: 'Second walk-in', symptoms: ['hesitation'] })).body as WorkOrderDto;
      expect(bare.setup).toEqual({});
      // The case was shared with the shop above.
      const onCase = (await shop.post('/api/work-orders').send({ caseId: c.id })).body as WorkOrderDto;
      expect(onCase.setup).toEqual(c.setup);
      const listed: WorkOrderDto[] = (await shop.get('/api/work-orders')).body.workOrders;
      expect(listed.find((w) => w.id === walkIn.body.id)?.setup).toEqual(setup);
      expect(listed.find((w) => w.id === onCase.id)?.setup).toEqual(c.setup);
    });
  });

  describe('GET /api/rulesets/proposals', () => {
    it('is for shops and admins only', async () => {
      for (const who of [racer, coach]) expect((await who.get('/api/rulesets/proposals')).status).toBe(403);
      expect((await t.http.get('/api/rulesets/proposals')).status).toBe(401);
      for (const who of [shop, admin]) {
        const res = await who.get('/api/rulesets/proposals');
        expect(res.status).toBe(200);
        expect(res.body).toEqual({ proposals: [] });
      }
    });

    it('lists proposals newest first with who started them and the back-test figures, without the diff; published ones as such', async () => {
      await insertOutcomeRecords(t.db.db, generateOutcomes({ count: 300, seed: 11 }));
      const runner = t.app.get(ProposalRunner);
      const a = (await shop.post('/api/rulesets/proposals').send({ strength: 100, version: '1.1.0', seed: 2 })).body as ProposalDto;
      expect((await admin.get('/api/rulesets/proposals')).body.proposals.map((p: ProposalSummaryDto) => p.id)).toEqual([a.id]);
      await runner.wait(a.id);
      const b = (await admin.post('/api/rulesets/proposals').send({ strength: 400, version: '1.2.0', seed: 3 })).body as ProposalDto;
      await runner.wait(b.id);

      const listed: ProposalSummaryDto[] = (await shop.get('/api/rulesets/proposals')).body.proposals;
      expect(listed.map((p) => p.id)).toEqual([b.id, a.id]);
      expect(listed[0]).toMatchObject({ status: 'ready', proposedVersion: '1.2.0', baseVersion: SHIPPED_RULESET_VERSION, strength: 400, createdByName: await nameOf(admin), progress: 1 });
      expect(listed[1]).toMatchObject({ status: 'ready', proposedVersion: '1.1.0', strength: 100, createdByName: await nameOf(shop) });
      expect(listed[0]).not.toHaveProperty('result');
      // The figures are the ones the full proposal carries.
      for (const p of listed) {
        const full = (await shop.get(`/api/rulesets/proposals/${p.id}`)).body as ProposalDto;
        const bt = full.result!.backTest;
        expect(p.backTest).toEqual({
          heldOut: bt.heldOut,
          scored: bt.scored,
          before: { top1Rate: bt.before.top1Rate, top3Rate: bt.before.top3Rate, brier: bt.before.brier },
          after: { top1Rate: bt.after.top1Rate, top3Rate: bt.after.top3Rate, brier: bt.after.brier },
        });
        expect(p.backTest!.heldOut).toBeGreaterThan(0);
      }

      expect((await admin.post(`/api/rulesets/proposals/${a.id}/publish`).send({})).status).toBe(200);
      const after: ProposalSummaryDto[] = (await admin.get('/api/rulesets/proposals')).body.proposals;
      expect(after.find((p) => p.id === a.id)).toMatchObject({ status: 'published', proposedVersion: '1.1.0' });
      expect(after.find((p) => p.id === b.id)?.status).toBe('ready');
      await admin.post(`/api/rulesets/${SHIPPED_RULESET_VERSION}/activate`);
    });

    it(`stops at the newest ${PROPOSAL_LIST_LIMIT}, and names nobody when the starter's account is gone`, async () => {
      const base = Date.parse('2030-01-01T00:00:00Z');
      await t.db.db.insert(proposals).values(
        Array.from({ length: PROPOSAL_LIST_LIMIT + 5 }, (_, i) => ({
          baseVersion: '1.0.0',
          proposedVersion: `3.0.${i}`,
          strength: 50,
          seed: 1,
          holdOutFraction: 0.2,
          status: 'failed' as const,
          error: 'invented for the test',
          createdAt: new Date(base + i * 60_000),
        })),
      );
      const listed: ProposalSummaryDto[] = (await shop.get('/api/rulesets/proposals')).body.proposals;
      expect(listed).toHaveLength(PROPOSAL_LIST_LIMIT);
      expect(listed[0].proposedVersion).toBe(`3.0.${PROPOSAL_LIST_LIMIT + 4}`);
      expect(listed.at(-1)!.proposedVersion).toBe('3.0.5');
      expect(listed[0]).toMatchObject({ status: 'failed', error: 'invented for the test', createdByName: null, backTest: null });
      const stamps = listed.map((p) => p.createdAt);
      expect([...stamps].sort().reverse()).toEqual(stamps);
      // The account that started a proposal is deleted: the proposal stays, with no name.
      const [gone] = await t.db.db.insert(users).values({ email: 'gone@fuelwright.test', displayName: 'Gone user', role: 'shop', passwordHash: 'x' }).returning();
      await t.db.db.insert(proposals).values({ baseVersion: '1.0.0', proposedVersion: '4.0.0', strength: 50, seed: 1, holdOutFraction: 0.2, createdBy: gone.id, createdAt: new Date(base + 10 ** 8) });
      // A running one has no figures yet.
      expect((await shop.get('/api/rulesets/proposals')).body.proposals[0]).toMatchObject({ proposedVersion: '4.0.0', createdByName: 'Gone user', status: 'running', backTest: null });
      await t.db.db.delete(users).where(eq(users.id, gone.id));
      expect((await shop.get('/api/rulesets/proposals')).body.proposals[0]).toMatchObject({ proposedVersion: '4.0.0', createdByName: null });
    });
  });
});
