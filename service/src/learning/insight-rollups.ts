import { and, asc, eq, gt, gte, inArray, lt, lte, or, sql, type SQL } from 'drizzle-orm';
import { insightRollupDirty, insightRollups, outcomes, type Db } from '@fuelwright/db';
import { InsightsAccumulator, type InsightsState, type OpeningRank, type Ruleset } from '@fuelwright/rules';
import type { SymptomReport } from '@fuelwright/shared';

/** Days are UTC calendar days, `YYYY-MM-DD`, as the period filter reads them. */
const DAY_MS = 86_400_000;
const dayOf = (d: Date): string => d.toISOString().slice(0, 10);
const addDays = (day: string, n: number): string => dayOf(new Date(Date.parse(`${day}T00:00:00Z`) + n * DAY_MS));
const monthOf = (day: string): string => `${day.slice(0, 7)}-01`;
const addMonths = (month: string, n: number): string => {
  const d = new Date(`${month}T00:00:00Z`);
  d.setUTCMonth(d.getUTCMonth() + n);
  return dayOf(d);
};
const startOf = (day: string): Date => new Date(`${day}T00:00:00Z`);

/** Rows read per query while rebuilding a month's days. */
const BATCH = 2000;

export interface RefreshReport {
  /** Days rebuilt, and months re-merged from their days. */
  days: number;
  months: number;
  /** Current outcomes read. */
  outcomes: number;
  ms: number;
}

/**
 * Stored insight roll-ups: per ruleset version, the insight counters (an InsightsAccumulator
 * state) of each UTC day's current outcomes, and of each month merged from its days. Insights for
 * a period merge the whole months inside it and the days at its ends (at most about 60 days and
 * one row per month), so they answer in milliseconds whatever the number of outcomes.
 *
 * Freshness: triggers on `outcomes` list every day an insert, update or delete touches in
 * `insight_rollup_dirty` (bulk loads included). `refresh()` claims those rows, rebuilds the days
 * and their months from `outcomes`, and puts the claim back if it fails. Insights call it first,
 * so they always include every committed outcome.
 */
export class InsightRollups {
  private queued: Promise<RefreshReport> | null = null;
  private chain: Promise<unknown> = Promise.resolve();

  constructor(
    private readonly db: Db,
    /** The ruleset of a version, or undefined when the version is unknown. */
    private readonly rulesetOf: (version: string) => Ruleset | undefined,
  ) {}

  /**
   * Brings the roll-ups up to date. One refresh runs at a time; a caller that arrives while one
   * waits to start shares it, and one that arrives while one runs gets the next, so every caller
   * sees the outcomes committed before its call.
   */
  refresh(): Promise<RefreshReport> {
    if (this.queued) return this.queued;
    const next = this.chain.then(() => {
      this.queued = null;
      return this.rebuildDirty();
    });
    this.queued = next;
    this.chain = next.catch(() => undefined);
    return next;
  }

  /** Resolves once no refresh is running or waiting (errors are the callers' to see). */
  async idle(): Promise<void> {
    await this.chain;
  }

  /**
   * The states that make up one version's period (either bound may be absent), oldest first:
   * whole months inside it, and the days at its ends.
   */
  async states(version: string, from?: string, to?: string): Promise<InsightsState[]> {
    if (from && to && from > to) return [];
    const firstFull = from === undefined ? undefined : from.endsWith('-01') ? from : addMonths(monthOf(from), 1);
    // The last whole month: `to`'s own when `to` is its last day, else the one before.
    const lastFull = to === undefined ? undefined : addDays(to, 1).endsWith('-01') ? monthOf(to) : addMonths(monthOf(to), -1);
    const day = eq(insightRollups.kind, 'day');
    const month = eq(insightRollups.kind, 'month');
    const parts: SQL[] = [];
    if (firstFull !== undefined && lastFull !== undefined && firstFull > lastFull) {
      parts.push(and(day, gte(insightRollups.start, from!), lte(insightRollups.start, to!))!);
    } else {
      const m: SQL[] = [month];
      if (firstFull !== undefined) m.push(gte(insightRollups.start, firstFull));
      if (lastFull !== undefined) m.push(lte(insightRollups.start, lastFull));
      parts.push(and(...m)!);
      if (from !== undefined && from < firstFull!) parts.push(and(day, gte(insightRollups.start, from), lt(insightRollups.start, firstFull!))!);
      if (to !== undefined) {
        const afterLast = addMonths(lastFull!, 1);
        if (afterLast <= to) parts.push(and(day, gte(insightRollups.start, afterLast), lte(insightRollups.start, to))!);
      }
    }
    const rows = await this.db
      .select({ state: insightRollups.state })
      .from(insightRollups)
      .where(and(eq(insightRollups.rulesetVersion, version), or(...parts)))
      .orderBy(asc(insightRollups.start), asc(insightRollups.kind));
    return rows.map((r) => r.state as InsightsState);
  }

  private async rebuildDirty(): Promise<RefreshReport> {
    const t0 = performance.now();
    const claimed = await this.db.delete(insightRollupDirty).returning();
    const report: RefreshReport = { days: 0, months: 0, outcomes: 0, ms: 0 };
    if (claimed.length === 0) return report;
    try {
      const byVersion = new Map<string, Map<string, Set<string>>>();
      for (const { rulesetVersion, day } of claimed) {
        let months = byVersion.get(rulesetVersion);
        if (!months) byVersion.set(rulesetVersion, (months = new Map()));
        const m = monthOf(day);
        let days = months.get(m);
        if (!days) months.set(m, (days = new Set()));
        days.add(day);
      }
      for (const [version, months] of byVersion) {
        const ruleset = this.rulesetOf(version);
        for (const [month, days] of [...months].sort(([a], [b]) => (a < b ? -1 : 1))) {
          report.outcomes += await this.rebuildMonth(version, ruleset, month, days);
          report.days += days.size;
          report.months++;
        }
      }
    } catch (e) {
      await this.db.insert(insightRollupDirty).values(claimed).onConflictDoNothing();
      throw e;
    }
    report.ms = performance.now() - t0;
    return report;
  }

  /**
   * Rebuilds the given days of one month from the current outcomes, then the month from all its
   * days. A version no ruleset knows keeps no roll-ups (nothing can ask for its insights).
   */
  private async rebuildMonth(version: string, ruleset: Ruleset | undefined, month: string, days: Set<string>): Promise<number> {
    const sorted = [...days].sort();
    const dayRows = and(eq(insightRollups.rulesetVersion, version), eq(insightRollups.kind, 'day'));
    if (!ruleset) {
      await this.db.delete(insightRollups).where(and(eq(insightRollups.rulesetVersion, version), inArray(insightRollups.start, [...sorted, month])));
      return 0;
    }
    const accs = new Map<string, InsightsAccumulator>();
    let read = 0;
    const where: SQL[] = [
      eq(outcomes.rulesetVersion, version),
      gte(outcomes.at, startOf(sorted[0])),
      lt(outcomes.at, startOf(addDays(sorted[sorted.length - 1], 1))),
      sql`not exists (select 1 from "outcomes" o2 where o2."supersedes_id" = "outcomes"."id")`,
    ];
    let after: string | undefined;
    for (;;) {
      const batch = await this.db
        .select({
          id: outcomes.id,
          at: outcomes.at,
          caseId: outcomes.caseId,
          symptoms: outcomes.symptoms,
          carburettorKind: sql<string | null>`${outcomes.setup}->>'carburettorKind'`,
          openingRank: outcomes.openingRank,
          confirmedCauses: outcomes.confirmedCauses,
          labourMinutes: outcomes.labourMinutes,
          stillFixed: outcomes.stillFixed,
        })
        .from(outcomes)
        .where(and(...where, ...(after ? [gt(outcomes.id, after)] : [])))
        .orderBy(asc(outcomes.id))
        .limit(BATCH);
      for (const r of batch) {
        const day = dayOf(r.at);
        if (!days.has(day)) continue;
        let acc = accs.get(day);
        if (!acc) accs.set(day, (acc = new InsightsAccumulator(ruleset)));
        acc.add({
          id: r.id,
          caseId: r.caseId ?? undefined,
          rulesetVersion: version,
          symptoms: r.symptoms as SymptomReport[],
          setup: r.carburettorKind ? { carburettorKind: r.carburettorKind as 'pump-around' | 'float-valve' } : undefined,
          openingRank: r.openingRank as OpeningRank,
          confirmedCauses: r.confirmedCauses,
          labourMinutes: r.labourMinutes ?? undefined,
          stillFixed: r.stillFixed,
          at: r.at.toISOString(),
        });
        read++;
      }
      if (batch.length < BATCH) break;
      after = batch[batch.length - 1].id;
    }

    await this.db.transaction(async (tx) => {
      const empty = sorted.filter((d) => !accs.has(d));
      if (empty.length) await tx.delete(insightRollups).where(and(dayRows, inArray(insightRollups.start, empty)));
      const values = [...accs].map(([day, acc]) => {
        const state = acc.state();
        return { rulesetVersion: version, kind: 'day' as const, start: day, outcomes: state.n, state, updatedAt: new Date() };
      });
      if (values.length) {
        await tx
          .insert(insightRollups)
          .values(values)
          .onConflictDoUpdate({
            target: [insightRollups.rulesetVersion, insightRollups.kind, insightRollups.start],
            set: { outcomes: sql`excluded."outcomes"`, state: sql`excluded."state"`, updatedAt: sql`excluded."updated_at"` },
          });
      }
      const monthDays = await tx
        .select({ state: insightRollups.state })
        .from(insightRollups)
        .where(and(dayRows, gte(insightRollups.start, month), lt(insightRollups.start, addMonths(month, 1))))
        .orderBy(asc(insightRollups.start));
      const monthKey = and(eq(insightRollups.rulesetVersion, version), eq(insightRollups.kind, 'month'), eq(insightRollups.start, month));
      if (monthDays.length === 0) {
        await tx.delete(insightRollups).where(monthKey);
        return;
      }
      const acc = new InsightsAccumulator(ruleset);
      for (const d of monthDays) acc.merge(d.state as InsightsState);
      const state = acc.state();
      await tx
        .insert(insightRollups)
        .values({ rulesetVersion: version, kind: 'month', start: month, outcomes: state.n, state, updatedAt: new Date() })
        .onConflictDoUpdate({ target: [insightRollups.rulesetVersion, insightRollups.kind, insightRollups.start], set: { outcomes: state.n, state, updatedAt: new Date() } });
    });
    return read;
  }
}
