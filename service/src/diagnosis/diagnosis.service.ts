import { Inject, Injectable, Logger, NotFoundException, type OnModuleInit } from '@nestjs/common';
import { asc, eq } from 'drizzle-orm';
import { rulesets, type Db } from '@fuelwright/db';
import {
  buildDiagnosisEngine,
  loadRuleset,
  toRulesetSource,
  validateRuleset,
  type DiagnosisEngine,
  type Ruleset,
  type RulesetSource,
} from '@fuelwright/rules';
import type { CatalogResponse, RankRequest, RankResponse, RulesetVersionInfo } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { FieldsBadRequest } from '../common/validation.js';
import { DiagnosisPort } from './diagnosis.port.js';

/**
 * Holds one built engine per ruleset version, each built once and reused for every request. The
 * shipped ruleset is validated at start-up (a bad rule file stops the service with the file, the
 * rule and the field named) and stored as the first version; published versions live in the
 * database and are immutable. New cases use the active version; a case keeps the version it was
 * opened with.
 */
@Injectable()
export class DiagnosisService extends DiagnosisPort implements OnModuleInit {
  private readonly log = new Logger('Diagnosis');
  private readonly engines = new Map<string, DiagnosisEngine>();
  private current = '';

  constructor(@Inject(DB) private readonly db: Db) {
    super();
  }

  async onModuleInit(): Promise<void> {
    const shipped = buildDiagnosisEngine(loadRuleset());
    this.engines.set(shipped.version, shipped);
    const rows = await this.db.select().from(rulesets).orderBy(asc(rulesets.publishedAt));
    if (!rows.some((r) => r.version === shipped.version)) {
      // A newly shipped version (it may carry new cautions) takes over from an older shipped one;
      // a version a shop published from outcomes (it has a parent) stays active until an admin
      // activates the new one on the rulesets screen.
      const activeRow = rows.find((r) => r.active);
      const takeOver = !activeRow || activeRow.parentVersion === null;
      const { version: _v, ...source } = toRulesetSource(shipped.ruleset);
      await this.db.transaction(async (tx) => {
        if (takeOver) await tx.update(rulesets).set({ active: false }).where(eq(rulesets.active, true));
        await tx
          .insert(rulesets)
          .values({ version: shipped.version, source, notes: 'Shipped expert ruleset', active: takeOver })
          .onConflictDoNothing();
      });
      if (!takeOver) {
        this.log.log(`Ruleset ${shipped.version} shipped; ${activeRow!.version} (published from outcomes) stays active until an admin activates ${shipped.version}`);
      }
    }
    for (const row of await this.db.select().from(rulesets)) {
      if (!this.engines.has(row.version)) this.engines.set(row.version, buildDiagnosisEngine(validateRuleset(row.source as RulesetSource)));
      if (row.active) this.current = row.version;
    }
    if (!this.current) this.current = shipped.version;
    const e = this.engine();
    this.log.log(`Ruleset ${e.version} active: ${e.ruleset.rules.length} rules over ${e.catalog.causes.length} causes (${this.engines.size} version(s) loaded)`);
  }

  get currentVersion(): string {
    return this.current;
  }

  engine(version: string = this.current): DiagnosisEngine {
    const e = this.engines.get(version);
    if (!e) throw new NotFoundException(`No ruleset version "${version}".`);
    return e;
  }

  catalog(version?: string): CatalogResponse {
    return this.engine(version).catalog;
  }

  unknownIds(request: RankRequest, version?: string): Record<string, string[]> {
    const v = this.engine(version).validateRankRequest(request);
    return v.ok ? {} : v.fields;
  }

  /** Validates (400 naming each field or unknown id) and ranks. */
  async rank(request: unknown, version?: string): Promise<RankResponse> {
    const engine = this.engine(version);
    const v = engine.validateRankRequest(request);
    if (!v.ok) throw new FieldsBadRequest(v.fields, v.message);
    return engine.rank(request as RankRequest);
  }

  async versions(): Promise<RulesetVersionInfo[]> {
    const rows = await this.db.select().from(rulesets).orderBy(asc(rulesets.publishedAt));
    return rows.map((r) => {
      const e = this.engines.get(r.version);
      return {
        version: r.version,
        parentVersion: r.parentVersion,
        notes: r.notes,
        active: r.active,
        publishedAt: r.publishedAt.toISOString(),
        publishedBy: r.publishedBy,
        rules: e?.ruleset.rules.length ?? 0,
        causes: e?.catalog.causes.length ?? 0,
      };
    });
  }

  /** Stores a new, immutable version and makes it the active one. */
  async publish(ruleset: Ruleset, parentVersion: string, publishedBy: string, notes: string): Promise<void> {
    const engine = buildDiagnosisEngine(ruleset);
    const { version: _v, ...source } = toRulesetSource(ruleset);
    await this.db.transaction(async (tx) => {
      const [exists] = await tx.select({ v: rulesets.version }).from(rulesets).where(eq(rulesets.version, ruleset.version));
      if (exists) throw new FieldsBadRequest({ version: [`version ${ruleset.version} is already published; versions are immutable`] });
      await tx.update(rulesets).set({ active: false }).where(eq(rulesets.active, true));
      await tx.insert(rulesets).values({ version: ruleset.version, source, parentVersion, notes, active: true, publishedBy });
    });
    this.engines.set(engine.version, engine);
    this.current = engine.version;
  }

  /** Makes an earlier published version the active one again (nothing is deleted). */
  async activate(version: string): Promise<void> {
    this.engine(version);
    await this.db.transaction(async (tx) => {
      await tx.update(rulesets).set({ active: false }).where(eq(rulesets.active, true));
      await tx.update(rulesets).set({ active: true }).where(eq(rulesets.version, version));
    });
    this.current = version;
  }
}
