import { afterEach, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { rulesets } from '@fuelwright/db';
import { loadRuleset, SHIPPED_RULESET_VERSION, toRulesetSource } from '@fuelwright/rules';
import { DiagnosisService } from '../src/diagnosis/diagnosis.service.js';
import { cloneTemplateDatabase } from './test-app.js';
import type { DatabaseHandle } from '@fuelwright/db';

/**
 * What a start-up does when the code ships a ruleset version the database has not seen: it takes
 * over from an older shipped version, but not from a version a shop published from outcomes.
 */
describe('a newly shipped ruleset version at start-up', () => {
  let handle: DatabaseHandle | undefined;
  afterEach(async () => {
    await handle?.close();
    handle = undefined;
  });

  /** A database as an install of the previous release left it: only `older` stored, and `activeVersion` active. */
  async function databaseBefore(rows: { version: string; parentVersion: string | null; active: boolean }[]) {
    handle = await cloneTemplateDatabase();
    const db = handle.db;
    await db.delete(rulesets);
    for (const r of rows) {
      const { version: _v, ...source } = toRulesetSource(loadRuleset('1.0.0'));
      await db.insert(rulesets).values({ version: r.version, source, parentVersion: r.parentVersion, active: r.active, notes: 'before' });
    }
    return db;
  }

  async function start(db: DatabaseHandle['db']) {
    const service = new DiagnosisService(db);
    await service.onModuleInit();
    const stored = await db.select().from(rulesets);
    return { service, stored: new Map(stored.map((r) => [r.version, r])) };
  }

  it('takes over from an older shipped version, so new cases get its cautions', async () => {
    const db = await databaseBefore([{ version: '1.0.0', parentVersion: null, active: true }]);
    const { service, stored } = await start(db);
    expect(service.currentVersion).toBe(SHIPPED_RULESET_VERSION);
    expect(stored.get(SHIPPED_RULESET_VERSION)?.active).toBe(true);
    expect(stored.get('1.0.0')?.active).toBe(false);
    // Cases opened under 1.0.0 still rank with it.
    expect(service.engine('1.0.0').version).toBe('1.0.0');
  });

  it('leaves a version published from outcomes active and stores the shipped one beside it', async () => {
    const db = await databaseBefore([
      { version: '1.0.0', parentVersion: null, active: false },
      { version: '1.1.0', parentVersion: '1.0.0', active: true },
    ]);
    const { service, stored } = await start(db);
    expect(service.currentVersion).toBe('1.1.0');
    expect(stored.get(SHIPPED_RULESET_VERSION)?.active).toBe(false);
    expect(stored.get('1.1.0')?.active).toBe(true);
  });

  it('makes the shipped version active on an empty database, and a second start changes nothing', async () => {
    const db = await databaseBefore([]);
    expect((await start(db)).service.currentVersion).toBe(SHIPPED_RULESET_VERSION);
    const again = await start(db);
    expect(again.service.currentVersion).toBe(SHIPPED_RULESET_VERSION);
    expect(again.stored.size).toBe(1);
    expect((await db.select().from(rulesets).where(eq(rulesets.active, true))).map((r) => r.version)).toEqual([SHIPPED_RULESET_VERSION]);
  });
});
