import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq, gt, gte, lt, sql, type SQL } from 'drizzle-orm';
import { outcomes, type Db, type OutcomeRow } from '@fuelwright/db';
import type { OpeningRank, OutcomeRecord } from '@fuelwright/rules';
import type { SetupSnapshot, SymptomReport } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';

export interface OutcomeFilter {
  from?: string;
  to?: string;
  version?: string;
  loggedBy?: string;
}

const BATCH = 2000;

/** Reads outcomes in id order, a batch at a time, so 50,000 of them never sit in memory at once. */
@Injectable()
export class OutcomeRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  where(f: OutcomeFilter, currentOnly = true): SQL[] {
    const w: SQL[] = [];
    if (currentOnly) w.push(sql`not exists (select 1 from "outcomes" o2 where o2."supersedes_id" = "outcomes"."id")`);
    if (f.from) w.push(gte(outcomes.at, new Date(`${f.from}T00:00:00Z`)));
    if (f.to) w.push(lt(outcomes.at, new Date(new Date(`${f.to}T00:00:00Z`).getTime() + 24 * 3600 * 1000)));
    if (f.version) w.push(eq(outcomes.rulesetVersion, f.version));
    if (f.loggedBy) w.push(eq(outcomes.loggedBy, f.loggedBy));
    return w;
  }

  async *rows(f: OutcomeFilter, currentOnly = true): AsyncGenerator<OutcomeRow> {
    let after: string | undefined;
    for (;;) {
      const w = this.where(f, currentOnly);
      if (after) w.push(gt(outcomes.id, after));
      const batch = await this.db.select().from(outcomes).where(and(...w)).orderBy(asc(outcomes.id)).limit(BATCH);
      for (const r of batch) yield r;
      if (batch.length < BATCH) return;
      after = batch[batch.length - 1].id;
    }
  }

  async *records(f: OutcomeFilter): AsyncGenerator<OutcomeRecord> {
    for await (const r of this.rows(f)) yield toRecord(r);
  }

  async count(f: OutcomeFilter): Promise<number> {
    const [{ n }] = await this.db.select({ n: sql<number>`count(*)::int` }).from(outcomes).where(and(...this.where(f)));
    return n;
  }
}

export function toRecord(r: OutcomeRow): OutcomeRecord {
  return {
    id: r.id,
    caseId: r.caseId ?? undefined,
    rulesetVersion: r.rulesetVersion,
    symptoms: r.symptoms as SymptomReport[],
    setup: r.setup as SetupSnapshot,
    openingRank: r.openingRank as OpeningRank,
    confirmedCauses: r.confirmedCauses,
    labourMinutes: r.labourMinutes ?? undefined,
    stillFixed: r.stillFixed,
    at: r.at.toISOString(),
    demo: r.demo,
  };
}
