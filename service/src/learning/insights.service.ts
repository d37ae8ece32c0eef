import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { and, eq, gte, lt, sql, type SQL } from 'drizzle-orm';
import { cases, type Db } from '@fuelwright/db';
import { InsightsAccumulator } from '@fuelwright/rules';
import type { InsightsResponse } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { DiagnosisService } from '../diagnosis/diagnosis.service.js';
import { InsightRollups, type RefreshReport } from './insight-rollups.js';
import type { OutcomeFilter } from './outcome-repository.js';

/**
 * Insights for a ruleset version and period, merged from the stored day and month roll-ups
 * (see InsightRollups), which are brought up to date first.
 */
@Injectable()
export class InsightsService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly log = new Logger('Insights');
  readonly rollups: InsightRollups;

  constructor(
    private readonly diagnosis: DiagnosisService,
    @Inject(DB) private readonly db: Db,
  ) {
    this.rollups = new InsightRollups(db, (version) => {
      try {
        return diagnosis.engine(version).ruleset;
      } catch {
        return undefined;
      }
    });
  }

  /** Builds what a bulk load or an older database left to do, in the background, so the first request is quick. */
  onApplicationBootstrap(): void {
    void this.refresh().catch((e) => this.log.error(`Building the insight roll-ups failed: ${e instanceof Error ? e.message : e}`));
  }

  async onModuleDestroy(): Promise<void> {
    await this.rollups.idle();
  }

  async refresh(): Promise<RefreshReport> {
    const report = await this.rollups.refresh();
    if (report.days > 100) {
      this.log.log(`Insight roll-ups rebuilt: ${report.days} days, ${report.months} months, ${report.outcomes} outcomes in ${(report.ms / 1000).toFixed(1)} s`);
    }
    return report;
  }

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
    await this.refresh();
    for (const state of await this.rollups.states(version, f.from, f.to)) acc.merge(state);
    const insights = acc.result();
    return { version, from: f.from ?? null, to: f.to ?? null, cases: await this.caseCount(f, version), outcomes: insights.outcomes, insights };
  }
}
