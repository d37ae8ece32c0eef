/**
 * Loads the INVENTED outcome history (fixtures/generate-outcomes.ts) into the app's database, so
 * the insights and ruleset screens have something to show. Every record is marked demo.
 *
 *   npm run seed:outcomes -- --count 50000 --seed 7 [--data-dir ./data] [--replace]
 *
 * The database is the app's: PGlite in <data dir>/pglite (DATA_DIR, default ./data), or the
 * PostgreSQL server in DATABASE_URL. Stop the app first when it uses PGlite: only one process may
 * hold a PGlite data folder. The migrations are applied first, as at the app's start-up.
 * `--replace` deletes the demo outcomes already there before loading (real outcomes are kept).
 * It imports the rules package from source, which resolves `@fuelwright/shared` and
 * `@fuelwright/db` to their builds: run `npm run build:libs` after changing them.
 */
import { isAbsolute, join, resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { eq, sql } from 'drizzle-orm';
import { openDatabase, outcomes, rulesets } from '@fuelwright/db';
import { loadRuleset, validateRuleset, type Ruleset, type RulesetSource } from '@fuelwright/rules';
import { generateOutcomes } from '../../fixtures/generate-outcomes.js';
import { insertOutcomeRecords } from '../src/learning/demo-outcomes.js';
import { InsightRollups } from '../src/learning/insight-rollups.js';

function usage(message: string): never {
  console.error(`${message}\nUsage: npm run seed:outcomes -- --count 50000 --seed 7 [--data-dir ./data] [--replace] [--drift 0.35]`);
  process.exit(2);
}

async function main(): Promise<void> {
  let values;
  try {
    ({ values } = parseArgs({
      options: {
        count: { type: 'string', default: '50000' },
        seed: { type: 'string', default: '7' },
        'data-dir': { type: 'string' },
        drift: { type: 'string' },
        replace: { type: 'boolean', default: false },
        help: { type: 'boolean', short: 'h', default: false },
      },
      strict: true,
    }));
  } catch (e) {
    usage(e instanceof Error ? e.message : String(e));
  }
  if (values.help) usage('Loads invented (demo) outcomes into the database.');
  const count = Number(values.count);
  if (!Number.isInteger(count) || count < 1 || count > 1_000_000) usage(`--count must be a whole number from 1 to 1,000,000 (got "${values.count}")`);
  const drift = values.drift === undefined ? undefined : Number(values.drift);
  if (drift !== undefined && !(drift >= 0 && drift <= 2)) usage(`--drift must be a number from 0 to 2 (got "${values.drift}")`);
  const seed = /^-?\d+$/.test(values.seed) ? Number(values.seed) : values.seed;

  const databaseUrl = process.env.DATABASE_URL || undefined;
  const dataDirRaw = values['data-dir'] ?? (process.env.DATA_DIR || './data');
  const dataDir = isAbsolute(dataDirRaw) ? dataDirRaw : resolve(process.cwd(), dataDirRaw);
  const where = databaseUrl ? 'the PostgreSQL server in DATABASE_URL' : `PGlite in ${join(dataDir, 'pglite')}`;
  console.log(`Seeding ${count.toLocaleString('en')} invented outcomes (seed ${seed}) into ${where}`);

  const started = performance.now();
  const handle = await openDatabase(databaseUrl ? { databaseUrl } : { dataDir: join(dataDir, 'pglite') });
  try {
    await handle.migrate();
    if (values.replace) {
      const removed = await handle.db.delete(outcomes).where(eq(outcomes.demo, true)).returning({ id: outcomes.id });
      console.log(`Removed ${removed.length.toLocaleString('en')} demo outcomes loaded before`);
    }
    const opened = performance.now();
    let shown = 0;
    const records = (function* () {
      let n = 0;
      for (const r of generateOutcomes({ count, seed, drift })) {
        yield { ...r, demo: true };
        if (++n - shown >= 10_000) {
          shown = n;
          console.log(`  ${n.toLocaleString('en')} generated`);
        }
      }
    })();
    const inserted = await insertOutcomeRecords(handle.db, records);
    const done = performance.now();
    const [{ total }] = await handle.db.select({ total: sql<number>`count(*)::int` }).from(outcomes);
    console.log(
      `Inserted ${inserted.toLocaleString('en')} demo outcomes in ${((done - opened) / 1000).toFixed(1)} s ` +
        `(${((done - started) / 1000).toFixed(1)} s with opening and migrating); the database now holds ${total.toLocaleString('en')} outcomes.`,
    );
    // The insight roll-ups of the days just loaded (the app would build them at its next start).
    const known = new Map<string, Ruleset>();
    const shipped = loadRuleset();
    known.set(shipped.version, shipped);
    for (const row of await handle.db.select().from(rulesets)) {
      if (!known.has(row.version)) known.set(row.version, validateRuleset(row.source as RulesetSource));
    }
    const report = await new InsightRollups(handle.db, (v) => known.get(v)).refresh();
    console.log(`Built the insight roll-ups: ${report.days.toLocaleString('en')} days and ${report.months} months in ${(report.ms / 1000).toFixed(1)} s.`);
  } finally {
    await handle.close();
  }
}

main().catch((e) => {
  console.error(e instanceof Error ? (e.stack ?? e.message) : e);
  process.exit(1);
});
