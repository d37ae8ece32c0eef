import { Inject, Injectable } from '@nestjs/common';
import { and, eq, gte, lt, sql, type SQL } from 'drizzle-orm';
import { cases, type Db } from '@fuelwright/db';
import { DB } from '../database/database.tokens.js';
import { InsightsAccumulator, type Insights } from '@fuelwright/rules';
import { DiagnosisService } from '../diagnosis/diagnosis.service.js';
import { OutcomeRepository, type OutcomeFilter } from './outcome-repository.js';

export interface InsightsResponse {
  version: string;
  from: string | null;
  to: string | null;
  /** Cases opened in the period under this version. */
  cases: number;
  outcomes: number;
  insights: Insights;
}

/** Streams the period's outcomes through the metric accumulators (bounded memory, one pass). */
@Injectable()
export class InsightsService {
  constructor(
    private readonly outcomes: OutcomeRepository,
    private readonly diagnosis: DiagnosisService,
    @Inject(DB) private readonly db: Db,
  ) {}

  private async caseCount(f: OutcomeFilter, version: string): Promise<number> {
    const w: SQL[] = [eq(cases.rulesetVersion, version)];
    if (f.from) w.push(gte(cases.openedAt, new Date(`${f.from}T00:00:00Z`)));
    if (f.to) w.push(lt(cases.openedAt, new Date(new Date(`${f.to}T00:00:00Z`).getTime() + 86_400_000)));
    const [{ n }] = await this.db.select({ n: sql<number>`count(*)::int` }).from(cases).where(and(...w));
    return n;
  }

  async compute(f: OutcomeFilter): Promise<InsightsResponse> {
    const version = f.version ?? this.diagnosis.currentVersion;
    const acc = new InsightsAccumulator(this.diagnosis.engine(version).ruleset);
    for await (const o of this.outcomes.records({ ...f, version })) acc.add(o);
    const insights = acc.result();
    return { version, from: f.from ?? null, to: f.to ?? null, cases: await this.caseCount(f, version), outcomes: insights.outcomes, insights };
  }
}
