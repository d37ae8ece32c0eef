/**
 * Learning from outcomes at the target scale: 50,000 invented outcomes (fixtures/generate-outcomes.ts)
 * written to a JSON-lines file, then
 *   1. the insight metrics, streamed from the file one record at a time;
 *   2. a refinement proposal with its back-test (20 % held out), streamed from the file, with the
 *      default ranker (the fired rules scored under each ruleset);
 *   3. the same proposal on a smaller slice with the full engine as the back-test ranker, to show
 *      what the engine would cost per held-out outcome.
 * Prints wall and CPU time and peak heap; nothing here asserts a time.
 *
 *   npm run bench:learning -w rules
 *   BENCH_OUTCOMES=50000 BENCH_ENGINE_OUTCOMES=5000 BENCH_STRENGTH=200 npm run bench:learning -w rules
 */
import { createReadStream, createWriteStream, mkdtempSync, rmSync, statSync } from 'node:fs';
import { once } from 'node:events';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { generateOutcomes } from '../../fixtures/generate-outcomes.js';
import { InsightsAccumulator, buildDiagnosisEngine, createEngineRanker, loadRuleset, proposeRuleset, type OutcomeRecord } from '../src/index.js';

const COUNT = Number(process.env.BENCH_OUTCOMES ?? 50_000);
const ENGINE_COUNT = Number(process.env.BENCH_ENGINE_OUTCOMES ?? 5_000);
const STRENGTH = Number(process.env.BENCH_STRENGTH ?? 200);
const SEED = 7;

const gc = (globalThis as { gc?: () => void }).gc;
let peakHeap = 0;
const sampleHeap = () => (peakHeap = Math.max(peakHeap, process.memoryUsage().heapUsed));
const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(0)} MB`;

async function timed<T>(label: string, run: () => Promise<T>): Promise<T> {
  gc?.();
  peakHeap = process.memoryUsage().heapUsed;
  const heapBefore = peakHeap;
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const timer = setInterval(sampleHeap, 20);
  try {
    return await run();
  } finally {
    clearInterval(timer);
    sampleHeap();
    const wall = performance.now() - t0;
    const cpu = process.cpuUsage(cpu0);
    console.log(`${label.padEnd(58)} wall ${(wall / 1000).toFixed(2).padStart(6)} s   cpu ${((cpu.user + cpu.system) / 1e6).toFixed(2).padStart(6)} s   peak heap ${mb(peakHeap)} (start ${mb(heapBefore)})`);
  }
}

/** The outcomes of a JSON-lines file, one at a time (what the service does with a database cursor). */
async function* readOutcomes(file: string, limit = Infinity): AsyncGenerator<OutcomeRecord> {
  const lines = createInterface({ input: createReadStream(file), crlfDelay: Infinity });
  let n = 0;
  for await (const line of lines) {
    if (!line) continue;
    if (n++ >= limit) break;
    sampleHeap();
    yield JSON.parse(line) as OutcomeRecord;
  }
  lines.close();
}

async function main(): Promise<void> {
  const dir = mkdtempSync(join(tmpdir(), 'fuelwright-learning-bench-'));
  const file = join(dir, 'outcomes.jsonl');
  const ruleset = loadRuleset();
  console.log(`Learning bench: ${COUNT.toLocaleString('en')} invented outcomes, ruleset ${ruleset.version} (${ruleset.rules.length} rules), strength ${STRENGTH}, Node ${process.version}`);
  console.log(`(machine load average ${(await import('node:os')).loadavg().map((x) => x.toFixed(1)).join(' ')})\n`);
  try {
    await timed(`generate ${COUNT.toLocaleString('en')} outcomes to JSON lines`, async () => {
      const out = createWriteStream(file);
      let batch: string[] = [];
      for (const o of generateOutcomes({ count: COUNT, seed: SEED })) {
        batch.push(JSON.stringify(o));
        if (batch.length === 1000) {
          if (!out.write(batch.join('\n') + '\n')) await once(out, 'drain');
          batch = [];
        }
      }
      if (batch.length) out.write(batch.join('\n') + '\n');
      out.end();
      await once(out, 'finish');
    });
    console.log(`  file size ${mb(statSync(file).size)}\n`);

    let addMs = 0;
    const insights = await timed('insights: read + parse + accumulate (streamed)', async () => {
      const acc = new InsightsAccumulator(ruleset);
      for await (const o of readOutcomes(file)) {
        const t = performance.now();
        acc.add(o);
        addMs += performance.now() - t;
      }
      return acc.result();
    });
    console.log(`  of which accumulate: ${(addMs / 1000).toFixed(2)} s (${((addMs * 1000) / COUNT).toFixed(1)} us per outcome)`);
    console.log(`  top-1 ${(insights.accuracy.top1Rate * 100).toFixed(1)} %, top-3 ${(insights.accuracy.top3Rate * 100).toFixed(1)} %, Brier ${insights.accuracy.brier.toFixed(4)}, ECE ${insights.calibration.expectedCalibrationError.toFixed(4)}\n`);

    let progressCalls = 0;
    const proposal = await timed('proposal + back-test, fired-rules ranker (streamed)', () =>
      proposeRuleset(ruleset, readOutcomes(file), {
        version: `${ruleset.version}-bench`,
        strength: STRENGTH,
        seed: SEED,
        holdOutFraction: 0.2,
        total: COUNT,
        onProgress: () => {
          progressCalls++;
          // Yield to the event loop the way a service streaming progress would.
          return new Promise<void>((resolve) => setImmediate(resolve));
        },
      }),
    );
    const bt = proposal.backTest;
    console.log(`  fit on ${proposal.fit.outcomes.toLocaleString('en')}, held out ${bt.heldOut.toLocaleString('en')}; ${proposal.changedPriors} priors and ${proposal.changedRules} ratios changed; ${progressCalls} progress reports`);
    console.log(`  back-test before: top-1 ${(bt.before.top1Rate * 100).toFixed(1)} %, top-3 ${(bt.before.top3Rate * 100).toFixed(1)} %, Brier ${bt.before.brier.toFixed(4)}`);
    console.log(`  back-test after:  top-1 ${(bt.after.top1Rate * 100).toFixed(1)} %, top-3 ${(bt.after.top3Rate * 100).toFixed(1)} %, Brier ${bt.after.brier.toFixed(4)}\n`);

    const engineProposal = await timed(`proposal + back-test on ${ENGINE_COUNT.toLocaleString('en')}, full engine as ranker`, () =>
      proposeRuleset(ruleset, readOutcomes(file, ENGINE_COUNT), {
        version: `${ruleset.version}-bench`,
        strength: STRENGTH,
        seed: SEED,
        holdOutFraction: 0.2,
        total: ENGINE_COUNT,
        rank: createEngineRanker(buildDiagnosisEngine),
      }),
    );
    console.log(`  held out ${engineProposal.backTest.heldOut.toLocaleString('en')} (each ranked twice by the engine)`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
