/**
 * Ranking time: the json-rules-engine path against the plain TypeScript evaluator of the same
 * rules, in the same run, for the shipped ruleset and a generated 2,000-rule / 200-cause one.
 * Prints median and p99 per request (validation, facts, rules, belief, plan: the whole `rank`).
 * Figures only; nothing here asserts a time.
 *
 *   npm run bench -w rules
 */
import { performance } from 'node:perf_hooks';
import type { RankRequest } from '@fuelwright/shared';
import {
  SHIPPED_RULESET_SOURCES,
  buildDiagnosisEngine,
  createPlainEvaluator,
  loadRuleset,
  validateRuleset,
  type Ruleset,
} from '../src/index.js';
import { generateRequests, generateRulesetSource } from '../src/generate-ruleset.js';
import { SHIPPED_REQUESTS } from './shipped-requests.js';

const WARMUP = Number(process.env.BENCH_WARMUP ?? 300);
const SAMPLES = Number(process.env.BENCH_SAMPLES ?? 3000);
const NOW = new Date('2026-12-01');

interface Stats {
  median: number;
  p99: number;
  mean: number;
}

function stats(samples: number[]): Stats {
  const s = [...samples].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return { median: at(0.5), p99: at(0.99), mean: s.reduce((a, b) => a + b, 0) / s.length };
}

async function measure(run: (req: RankRequest) => unknown, requests: RankRequest[], samples = SAMPLES): Promise<Stats> {
  for (let i = 0; i < WARMUP; i++) await run(requests[i % requests.length]);
  const out: number[] = [];
  for (let i = 0; i < samples; i++) {
    const req = requests[i % requests.length];
    const t0 = performance.now();
    await run(req);
    out.push(performance.now() - t0);
  }
  return stats(out);
}

/**
 * The engine and the plain evaluator measured in alternation, request by request, so a change
 * in machine load during the run touches both alike and the ratio stays fair.
 */
async function measurePair(a: (req: RankRequest) => unknown, b: (req: RankRequest) => unknown, requests: RankRequest[]): Promise<[Stats, Stats]> {
  for (let i = 0; i < WARMUP; i++) {
    await a(requests[i % requests.length]);
    await b(requests[i % requests.length]);
  }
  const sa: number[] = [];
  const sb: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    const req = requests[i % requests.length];
    let t0 = performance.now();
    await a(req);
    sa.push(performance.now() - t0);
    t0 = performance.now();
    await b(req);
    sb.push(performance.now() - t0);
  }
  return [stats(sa), stats(sb)];
}

const collect = () => (globalThis as { gc?: () => void }).gc?.();

const ms = (v: number) => `${v.toFixed(3)} ms`;

async function benchRuleset(title: string, ruleset: Ruleset, requests: RankRequest[], target: number) {
  const t0 = performance.now();
  const engine = buildDiagnosisEngine(ruleset);
  const buildMs = performance.now() - t0;
  const unindexed = buildDiagnosisEngine(ruleset, { indexed: false, shareConditions: false });
  const plain = createPlainEvaluator(ruleset);
  const plainAll = createPlainEvaluator(ruleset, { indexed: false });

  // Both paths must agree before their times mean anything.
  for (const req of requests) {
    const a = JSON.stringify(await engine.firedRules(req, { now: NOW }));
    const b = JSON.stringify(plain.firedRules(req, { now: NOW }));
    const c = JSON.stringify(plainAll.firedRules(req, { now: NOW }));
    if (a !== b || a !== c) throw new Error(`${title}: the engine and the plain evaluator fired different rules`);
  }

  collect();
  const [eng, pl] = await measurePair((r) => engine.rank(r, { now: NOW }), (r) => plain.rank(r, { now: NOW }), requests);
  collect();
  const slow = Math.max(200, Math.floor(SAMPLES / 10));
  const engAll = await measure((r) => unindexed.rank(r, { now: NOW }), requests, slow);
  collect();
  const plAll = await measure((r) => plainAll.rank(r, { now: NOW }), requests, slow);

  const c = ruleset.catalog;
  console.log(`\n${title}: ${ruleset.rules.length} rules, ${c.causes.length} causes, ${c.symptoms.length} symptoms, ${c.checks.length} checks; ${requests.length} requests cycled, ${SAMPLES} samples`);
  console.log(`  engine built in ${ms(buildMs)}`);
  console.log(`  json-rules-engine, indexed (shipped path)  median ${ms(eng.median)}  p99 ${ms(eng.p99)}  target median < ${target} ms: ${eng.median < target ? 'met' : 'NOT met'}`);
  console.log(`  plain evaluator, indexed                   median ${ms(pl.median)}  p99 ${ms(pl.p99)}`);
  console.log(`  ratio engine / plain (median)              ${(eng.median / pl.median).toFixed(2)}x  target < 3x: ${eng.median / pl.median < 3 ? 'met' : 'NOT met'}`);
  console.log(`  for comparison (${slow} samples each):`);
  console.log(`  json-rules-engine, no index, no shared conditions  median ${ms(engAll.median)}  p99 ${ms(engAll.p99)}`);
  console.log(`  plain evaluator, no index                          median ${ms(plAll.median)}  p99 ${ms(plAll.p99)}`);
}

async function main() {
  console.log(`rank bench (Node ${process.version}; warm-up ${WARMUP}, samples ${SAMPLES})`);
  const shipped = loadRuleset();
  await benchRuleset(`shipped ruleset ${shipped.version}`, shipped, SHIPPED_REQUESTS, 2);

  const base = SHIPPED_RULESET_SOURCES[shipped.version].catalog as { cautions: unknown[]; groups: unknown[] };
  const t0 = performance.now();
  const source = generateRulesetSource({ rules: 2000, causes: 200, symptoms: 160, checks: 300 }, 1, base);
  const generated = validateRuleset(source);
  console.log(`\ngenerated ruleset validated in ${ms(performance.now() - t0)}`);
  await benchRuleset('generated ruleset', generated, generateRequests(source, 50), 20);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
