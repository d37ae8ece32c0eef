/**
 * Learning from outcomes over HTTP, at the target scale: a temporary PGlite database (migrated,
 * demo club seeded) with 50,000 INVENTED outcomes (fixtures/generate-outcomes.ts, marked demo),
 * the real Nest application listening on loopback, and the demo admin signed in. Measures
 *   1. the start-up, until the day and month roll-ups of the bulk-loaded outcomes are built (in the
 *      background); then GET /api/insights: the first request, and the median and max of 5 runs
 *      over everything and of 5 runs over a period with ragged ends (target under 1 s);
 *   2. a proposal with back-test, from POST to ready, polled as the UI polls it (target under 10 s),
 *      and how often the polled progress was seen rising;
 *   3. GET /api/outcomes.csv: time and bytes (streamed);
 *   4. the process's peak RSS while these run (client and server share the process).
 * Prints figures; nothing here asserts a time.
 *
 *   npm run bench -w service
 *   BENCH_OUTCOMES=50000 BENCH_STRENGTH=200 BENCH_POLL_MS=250 npm run bench -w service
 *
 * The service runs from its build (Nest needs decorator metadata, which tsx does not emit): the
 * bench builds it first with `tsc -b` (quick when nothing changed). It runs under
 * `node --import tsx/esm`, not the `tsx` command: the command's CommonJS hook loads a second copy
 * of @nestjs/core for `import` (beside the one `require` gives the Nest packages), and Nest then
 * cannot match its own Reflector ("can't resolve dependencies of the ThrottlerGuard").
 */
import 'reflect-metadata';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AddressInfo } from 'node:net';
import { openDatabase, readDemoFixture, seedDemoIfEmpty } from '@fuelwright/db';
import { generateOutcomes } from '../../fixtures/generate-outcomes.js';
import { insertOutcomeRecords } from '../src/learning/demo-outcomes.js';

const COUNT = Number(process.env.BENCH_OUTCOMES ?? 50_000);
const STRENGTH = Number(process.env.BENCH_STRENGTH ?? 200);
const POLL_MS = Number(process.env.BENCH_POLL_MS ?? 250);
const INSIGHT_RUNS = 5;
const SEED = 7;

const SERVICE = fileURLToPath(new URL('..', import.meta.url));
const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(0)} MB`;
const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

let peakRss = 0;
const sampleRss = () => (peakRss = Math.max(peakRss, process.memoryUsage().rss));

function median(xs: number[]): number {
  const sorted = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

async function main(): Promise<void> {
  console.log(`Building the service (tsc -b) ...`);
  const tsc = createRequire(import.meta.url).resolve('typescript/bin/tsc');
  execFileSync(process.execPath, [tsc, '-b', 'tsconfig.build.json'], { cwd: SERVICE, stdio: 'inherit' });
  const { createApp } = (await import('../dist/app.factory.js')) as typeof import('../src/app.factory.js');
  const { hashPassword } = (await import('../dist/auth/password.js')) as typeof import('../src/auth/password.js');

  const dir = mkdtempSync(join(tmpdir(), 'fw-bench-'));
  const t0 = performance.now();
  const handle = await openDatabase({ dataDir: join(dir, 'pglite') });
  await handle.migrate();
  await seedDemoIfEmpty(handle.db, hashPassword);
  const t1 = performance.now();
  console.log(`Temporary PGlite in ${dir}: migrated and demo club seeded in ${s(t1 - t0)}`);
  const inserted = await insertOutcomeRecords(handle.db, generateOutcomes({ count: COUNT, seed: SEED }));
  const t2 = performance.now();
  console.log(`Generated and inserted ${inserted.toLocaleString('en')} invented outcomes in ${s(t2 - t1)}`);

  const appStarted = performance.now();
  // BENCH_LOG=1 shows the application's log (start-up errors included).
  const app = await createApp({
    logger: process.env.BENCH_LOG ? undefined : false,
    database: handle,
    config: {
      sessionSecret: 'bench-secret-that-is-long-enough-0123456789',
      uiDist: '/nonexistent',
      seedDemo: false,
      mailPollMs: 0,
      mailCapturePort: 0,
      smtpUrl: undefined,
      publicUrl: 'http://fuelwright.test',
      s3Endpoint: undefined,
      objectsDir: join(dir, 'objects'),
    },
  });
  await app.listen(0, '127.0.0.1');
  // The start-up began building the roll-ups of the bulk-loaded outcomes in the background.
  const { InsightsService } = (await import('../dist/learning/insights.service.js')) as typeof import('../src/learning/insights.service.js');
  await app.get(InsightsService).rollups.idle();
  const rollupsMs = performance.now() - appStarted;
  console.log(`Application started and insight roll-ups built in ${s(rollupsMs)}`);
  const base = `http://127.0.0.1:${(app.getHttpServer().address() as AddressInfo).port}`;
  const sampler = setInterval(sampleRss, 25);
  const rssAtStart = process.memoryUsage().rss;
  try {
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'admin@fuelwright.test', password: readDemoFixture().password }),
    });
    if (signIn.status !== 200) throw new Error(`sign-in as the demo admin failed: ${signIn.status} ${await signIn.text()}`);
    const cookie = (signIn.headers.get('set-cookie') ?? '').split(';')[0];
    const get = (path: string) => fetch(`${base}${path}`, { headers: { cookie } });

    // 1. Insights: the first request waits for the roll-ups the start-up began building.
    const insight = async (path: string) => {
      const a = performance.now();
      const res = await get(path);
      const body = (await res.json()) as { outcomes: number };
      if (res.status !== 200) throw new Error(`GET ${path} answered ${res.status}`);
      return { ms: performance.now() - a, outcomes: body.outcomes };
    };
    const first = await insight('/api/insights');
    const insightTimes: number[] = [];
    const periodTimes: number[] = [];
    let outcomesSeen = 0;
    let periodOutcomes = 0;
    for (let i = 0; i < INSIGHT_RUNS; i++) {
      const all = await insight('/api/insights');
      insightTimes.push(all.ms);
      outcomesSeen = all.outcomes;
      const period = await insight('/api/insights?from=2025-03-17&to=2026-10-12');
      periodTimes.push(period.ms);
      periodOutcomes = period.outcomes;
    }

    // 2. A proposal with back-test, polled like the UI polls it.
    const p0 = performance.now();
    const started = await fetch(`${base}/api/rulesets/proposals`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', cookie },
      body: JSON.stringify({ strength: STRENGTH, version: '1.1.0', holdOutFraction: 0.2, seed: SEED }),
    });
    const { id } = (await started.json()) as { id: string };
    if (started.status !== 201) throw new Error(`POST /api/rulesets/proposals answered ${started.status}`);
    let polls = 0;
    let rises = 0;
    let last = 0;
    const seen: number[] = [];
    let proposal: { status: string; progress: number; error: string | null; result: { backTest: { heldOut: number; before: { top3Rate: number; brier: number }; after: { top3Rate: number; brier: number } }; changedRules: number; changedPriors: number } | null };
    for (;;) {
      const res = await get(`/api/rulesets/proposals/${id}`);
      proposal = (await res.json()) as typeof proposal;
      polls++;
      if (proposal.progress > last) {
        rises++;
        seen.push(proposal.progress);
        last = proposal.progress;
      }
      if (proposal.status !== 'running') break;
      await new Promise((r) => setTimeout(r, POLL_MS));
    }
    const proposalMs = performance.now() - p0;
    if (proposal.status !== 'ready' || !proposal.result) throw new Error(`the proposal ended ${proposal.status}: ${proposal.error}`);

    // 3. The outcomes CSV, streamed.
    const c0 = performance.now();
    const csv = await get('/api/outcomes.csv');
    let bytes = 0;
    let firstByteMs = 0;
    const reader = csv.body!.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      if (!firstByteMs) firstByteMs = performance.now() - c0;
      bytes += value.byteLength;
    }
    const csvMs = performance.now() - c0;
    sampleRss();

    const bt = proposal.result.backTest;
    const line = (label: string, value: string) => console.log(`  ${label.padEnd(46)} ${value}`);
    console.log(`\nFigures (${outcomesSeen.toLocaleString('en')} outcomes, demo admin over HTTP on loopback, Node ${process.version}):`);
    line('start-up, roll-ups of the bulk load built', `${s(rollupsMs)} (then the first insights request ${s(first.ms)})`);
    line('GET /api/insights, everything, 5 runs', `median ${s(median(insightTimes))}, max ${s(Math.max(...insightTimes))} (target < 1 s)`);
    line('', `runs: ${insightTimes.map((t) => s(t)).join(', ')}`);
    line('GET /api/insights, 2025-03-17 to 2026-10-12', `median ${s(median(periodTimes))}, max ${s(Math.max(...periodTimes))} over ${periodOutcomes.toLocaleString('en')} outcomes`);
    line('proposal with back-test, POST to ready', `${s(proposalMs)} (target < 10 s)`);
    line('', `polled ${polls} times every ${POLL_MS} ms; progress seen rising ${rises} times (${seen.map((x) => `${Math.round(x * 100)}%`).join(' ')})`);
    line('', `back-test on ${bt.heldOut.toLocaleString('en')} held out: top-3 ${(bt.before.top3Rate * 100).toFixed(1)} % -> ${(bt.after.top3Rate * 100).toFixed(1)} %, Brier ${bt.before.brier.toFixed(3)} -> ${bt.after.brier.toFixed(3)}; ${proposal.result.changedPriors} priors and ${proposal.result.changedRules} ratios changed`);
    line('GET /api/outcomes.csv', `${s(csvMs)} for ${mb(bytes)} (${bytes.toLocaleString('en')} bytes; first byte after ${s(firstByteMs)})`);
    line('peak RSS during the measurements', `${mb(peakRss)} (at the start ${mb(rssAtStart)}; process max RSS ${mb(process.resourceUsage().maxRSS * 1024)})`);
  } finally {
    clearInterval(sampler);
    await app.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((e) => {
  console.error(e instanceof Error ? (e.stack ?? e.message) : e);
  process.exit(1);
});
