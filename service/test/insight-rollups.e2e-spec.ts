/**
 * Insights answered from the stored day and month roll-ups give the same figures as one pass over
 * the outcomes of the period (computeInsights), for periods of whole months, month ends, single
 * days and open ends; and they follow every change to `outcomes` (bulk insert, a correction, a
 * delete) through the triggers that mark the days to rebuild. The outcomes are INVENTED
 * (fixtures/generate-outcomes.ts); the reference is the pure accumulator, not a hard-coded number.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq, inArray } from 'drizzle-orm';
import { insightRollupDirty, insightRollups, outcomes } from '@fuelwright/db';
import { SHIPPED_RULESET_VERSION, computeInsights, loadRuleset, type OutcomeRecord } from '@fuelwright/rules';
import { generateOutcomes } from '../../fixtures/generate-outcomes.js';
import { insertOutcomeRecords } from '../src/learning/demo-outcomes.js';
import { InsightsService } from '../src/learning/insights.service.js';
import { toRecord } from '../src/learning/outcome-repository.js';
import { createTestApp, demoUser, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** Deep equality (of a JSON answer) with numbers equal to 12 significant places (merging sums in another order rounds differently). */
function expectClose(actual: unknown, expected: unknown, path = '$'): void {
  // JSON writes NaN (an empty bin's mean) as null.
  if (typeof expected === 'number' && Number.isNaN(expected)) return void expect(actual, path).toBeNull();
  if (typeof expected === 'number' && typeof actual === 'number') {
    return void expect(Math.abs(actual - expected), `${path}: ${actual} vs ${expected}`).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(expected)));
  }
  if (expected === null || typeof expected !== 'object') return void expect(actual, path).toEqual(expected);
  expect(typeof actual, path).toBe('object');
  const a = actual as Record<string, unknown>;
  const e = expected as Record<string, unknown>;
  expect(Object.keys(a).sort(), path).toEqual(Object.keys(e).sort());
  for (const k of Object.keys(e)) expectClose(a[k], e[k], `${path}.${k}`);
}

const inPeriod = (o: OutcomeRecord, from?: string, to?: string) => (!from || o.at >= `${from}T00:00:00`) && (!to || o.at < `${to}T99`);

describe('insight roll-ups', () => {
  const ruleset = loadRuleset();
  // Outcomes from mid-January to early April 2026: partial months at both ends.
  const records = [...generateOutcomes({ count: 900, seed: 'rollups', from: '2026-01-15', to: '2026-04-10' })];
  let t: TestApp;
  let admin: Agent;
  let shop: Agent;
  /** What the database holds now, as records (ids and all), for the reference pass. */
  let current: OutcomeRecord[];

  /** The current (not superseded) outcomes as the database holds them. */
  const reload = async () => {
    const rows = await t.db.db.select().from(outcomes);
    const superseded = new Set(rows.map((r) => r.supersedesId).filter(Boolean));
    current = rows.filter((r) => !superseded.has(r.id)).map(toRecord);
  };
  const reference = (from?: string, to?: string) => computeInsights(ruleset, current.filter((o) => inPeriod(o, from, to)));
  const query = (from?: string, to?: string) => {
    const q = new URLSearchParams();
    if (from) q.set('from', from);
    if (to) q.set('to', to);
    return admin.get(`/api/insights?${q}`);
  };

  beforeAll(async () => {
    t = await createTestApp();
    admin = await signedIn(t, demoUser('admin'));
    shop = await signedIn(t, demoUser('shop'));
    await insertOutcomeRecords(t.db.db, records);
    await reload();
  });
  afterAll(() => t.close());

  it('marks every day of a bulk insert, and the first request builds the days and months', async () => {
    const dirty = await t.db.db.select().from(insightRollupDirty);
    const days = new Set(records.map((r) => r.at.slice(0, 10)));
    expect(new Set(dirty.map((d) => d.day))).toEqual(days);
    const res = await query();
    expect(res.status).toBe(200);
    expect(await t.db.db.select().from(insightRollupDirty)).toEqual([]);
    const stored = await t.db.db.select({ kind: insightRollups.kind, start: insightRollups.start, n: insightRollups.outcomes }).from(insightRollups);
    expect(stored.filter((r) => r.kind === 'month').map((r) => r.start).sort()).toEqual(['2026-01-01', '2026-02-01', '2026-03-01', '2026-04-01']);
    expect(stored.filter((r) => r.kind === 'day').length).toBe(days.size);
    // Each month holds the sum of its days.
    for (const m of stored.filter((r) => r.kind === 'month')) {
      const sum = stored.filter((r) => r.kind === 'day' && r.start.slice(0, 7) === m.start.slice(0, 7)).reduce((s, r) => s + r.n, 0);
      expect(m.n).toBe(sum);
    }
    expect(res.body.outcomes).toBe(records.length);
    expectClose(res.body.insights, reference());
  });

  const periods: [string, string | undefined, string | undefined][] = [
    ['everything', undefined, undefined],
    ['one whole month', '2026-02-01', '2026-02-28'],
    ['two whole months', '2026-02-01', '2026-03-31'],
    ['ends inside months', '2026-01-20', '2026-03-05'],
    ['a few days inside one month', '2026-02-10', '2026-02-12'],
    ['one day', '2026-03-17', '2026-03-17'],
    ['from a day on', '2026-02-17', undefined],
    ['up to a day', undefined, '2026-03-09'],
    ['up to a month end', undefined, '2026-02-28'],
    ['across a year end, before any outcome', '2025-12-20', '2026-01-31'],
  ];
  it.each(periods)('gives the one-pass figures for %s', async (_name, from, to) => {
    const res = await query(from, to);
    expect(res.status).toBe(200);
    const expected = reference(from, to);
    expect(expected.outcomes).toBeGreaterThan(0);
    expect(res.body.outcomes).toBe(expected.outcomes);
    expectClose(res.body.insights, expected);
  });

  it('reads whole months from their month row and only the end days from day rows', async () => {
    const rollups = t.app.get(InsightsService).rollups;
    expect((await rollups.states(SHIPPED_RULESET_VERSION, '2026-02-01', '2026-03-31')).length).toBe(2);
    // 2026-01-20..31 (up to 12 days), February and March whole, 2026-04-01..05 (up to 5 days).
    const mixed = await rollups.states(SHIPPED_RULESET_VERSION, '2026-01-20', '2026-04-05');
    expect(mixed.length).toBeLessThanOrEqual(12 + 2 + 5);
    expect(mixed.length).toBeGreaterThan(2);
    expect(await rollups.states(SHIPPED_RULESET_VERSION, '2026-03-10', '2026-03-01')).toEqual([]);
  });

  it('follows a correction: the superseded outcome stops counting on its own day and month', async () => {
    const target = current.find((o) => o.at.startsWith('2026-02-1'))!;
    const [{ at }] = await t.db.db.select({ at: outcomes.at }).from(outcomes).where(eq(outcomes.id, target.id));
    const fixedCause = target.confirmedCauses.includes('foam-degraded') ? 'return-tube-loose' : 'foam-degraded';
    const [row] = await t.db.db
      .insert(outcomes)
      .values({ rulesetVersion: SHIPPED_RULESET_VERSION, symptoms: target.symptoms, setup: target.setup ?? {}, openingRank: target.openingRank!, confirmedCauses: [fixedCause], fix: 'Corrected', supersedesId: target.id, demo: true })
      .returning();
    await reload();
    expect(current.some((o) => o.id === target.id)).toBe(false);
    expect(current.some((o) => o.id === row.id)).toBe(true);
    expect(at.toISOString().slice(0, 7)).toBe('2026-02');
    for (const [from, to] of [
      ['2026-02-01', '2026-02-28'],
      [undefined, undefined],
    ] as const) {
      const res = await query(from, to);
      expectClose(res.body.insights, reference(from, to));
    }
    // The shop sees the same figures (insights are not per shop).
    expect((await shop.get('/api/insights?from=2026-02-01&to=2026-02-28')).body.outcomes).toBe(reference('2026-02-01', '2026-02-28').outcomes);
  });

  it('follows deletes: a day emptied of outcomes leaves no day row, and its month shrinks', async () => {
    const day = '2026-03-17';
    const gone = current.filter((o) => o.at.startsWith(day)).map((o) => o.id);
    expect(gone.length).toBeGreaterThan(0);
    await t.db.db.delete(outcomes).where(inArray(outcomes.id, gone));
    await reload();
    const res = await query('2026-03-01', '2026-03-31');
    expectClose(res.body.insights, reference('2026-03-01', '2026-03-31'));
    expect((await query(day, day)).body.outcomes).toBe(0);
    const rows = await t.db.db.select().from(insightRollups).where(eq(insightRollups.start, day));
    expect(rows).toEqual([]);
  });

  it('rebuilds from the outcomes when the roll-ups are lost, and drops days of a version no ruleset knows', async () => {
    await t.db.db.delete(insightRollups);
    await t.db.db.insert(insightRollupDirty).values([...new Set(current.map((o) => o.at.slice(0, 10)))].map((day) => ({ rulesetVersion: SHIPPED_RULESET_VERSION, day })));
    const res = await query('2026-01-20', '2026-03-05');
    expectClose(res.body.insights, reference('2026-01-20', '2026-03-05'));
    // A day of an unknown version is dropped quietly; nothing stays marked.
    await t.db.db.insert(insightRollupDirty).values({ rulesetVersion: '9.9.9', day: '2026-02-02' });
    expect((await query()).status).toBe(200);
    expect(await t.db.db.select().from(insightRollupDirty)).toEqual([]);
  });
});
