import { outcomes, type Db } from '@fuelwright/db';
import type { OutcomeRecord } from '@fuelwright/rules';

/** Writes outcome records (the invented demo history) in multi-row batches; returns how many. */
export async function insertOutcomeRecords(db: Db, records: Iterable<OutcomeRecord> | AsyncIterable<OutcomeRecord>, batchSize = 1000): Promise<number> {
  let batch: (typeof outcomes.$inferInsert)[] = [];
  let n = 0;
  const flush = async () => {
    if (batch.length) await db.insert(outcomes).values(batch);
    n += batch.length;
    batch = [];
  };
  for await (const r of records as AsyncIterable<OutcomeRecord>) {
    batch.push({
      rulesetVersion: r.rulesetVersion,
      symptoms: r.symptoms,
      setup: r.setup ?? {},
      openingRank: r.openingRank ?? { causes: [], firedRules: [] },
      confirmedCauses: r.confirmedCauses,
      fix: 'Demo record (invented)',
      labourMinutes: r.labourMinutes ?? null,
      stillFixed: r.stillFixed ?? null,
      demo: r.demo ?? false,
      at: new Date(r.at),
    });
    if (batch.length >= batchSize) await flush();
  }
  await flush();
  return n;
}
