/**
 * A generated ruleset of any size, shaped like the shipped one (same cautions and groups, rules
 * of the same kinds in about the same proportions), for the bench and the scale tests.
 * Deterministic for a given seed. The numbers in it are random, not trade knowledge.
 */
import {
  CHECK_GROUPS,
  ENGINE_TEMPS,
  THROTTLE_BANDS,
  TRACK_POSITIONS,
  type RankRequest,
} from '@fuelwright/shared';
import { GROUP_HAZARDS, HAZARD_CAUTIONS, type RulesetSource } from './model.js';

/** Small, fast, seedable PRNG (mulberry32). */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface GeneratedSize {
  rules: number;
  causes: number;
  symptoms: number;
  checks: number;
}

const round = (v: number, step: number) => Math.round(v / step) * step;

/**
 * Generates a ruleset source: `size.rules` rules over `size.causes` causes. About 75 % of the
 * rules hang on one symptom (a quarter of those on a throttle band or track position too),
 * 10 % on a symptom and a setup value, 6 % on a symptom and the air density, 6 % on setup or
 * conditions alone, and 3 % on a check result (a few of them stop findings).
 */
export function generateRulesetSource(size: GeneratedSize, seed = 1, base: { cautions: unknown[]; groups: unknown[] }): RulesetSource {
  const rnd = prng(seed);
  const pick = <T>(list: readonly T[]): T => list[Math.floor(rnd() * list.length)];
  const symptoms = Array.from({ length: size.symptoms }, (_, i) => ({
    id: `gen-symptom-${i}`,
    label: `Generated symptom ${i}`,
    description: 'Generated for the bench.',
    dimensions: ['band', 'engine', 'where'],
    otherCausesLr: round(0.3 + rnd() * 0.7, 0.05),
    cautions: [],
  }));
  const causes = Array.from({ length: size.causes }, (_, i) => ({
    id: `gen-cause-${i}`,
    label: `Generated cause ${i}`,
    description: 'Generated for the bench.',
    prior: round(0.002 + rnd() * 0.02, 0.001),
    ...(rnd() < 0.1 ? { carburettorKinds: [pick(['pump-around', 'float-valve'] as const)] } : {}),
    fixes: ['gen-fix'],
  }));
  const checks = Array.from({ length: size.checks }, (_, i) => {
    const group = pick(CHECK_GROUPS);
    const hazards = [...(GROUP_HAZARDS[group] ?? [])];
    const tested = new Set<number>([i % size.causes]);
    const extra = Math.floor(rnd() * 3);
    for (let k = 0; k < extra; k++) tested.add(Math.floor(rnd() * size.causes));
    const specificity = round(0.85 + rnd() * 0.1, 0.01);
    return {
      id: `gen-check-${i}`,
      label: `Generated check ${i}`,
      group,
      minutes: round(0.5 + rnd() * 20, 0.5),
      hazards,
      cautions: [...new Set(hazards.flatMap((h) => HAZARD_CAUTIONS[h]))],
      steps: ['Generated step.'],
      tools: [],
      record: [],
      faultFoundMeans: 'Generated.',
      looksFineMeans: 'Generated.',
      tests: [...tested].map((c) => ({ cause: `gen-cause-${c}`, sensitivity: round(0.3 + rnd() * 0.6, 0.05) })),
      specificity,
    };
  });
  const catalog = {
    version: `gen-${size.rules}-${seed}`,
    stopAdvice: 'Do not drive; see a qualified engine builder.',
    somethingElse: { label: 'Something else', prior: 0.15 },
    groups: base.groups,
    cautions: base.cautions,
    symptoms,
    causes,
    checks,
    fixes: [{ id: 'gen-fix', label: 'Generated fix', minutes: 10, hazards: [], cautions: [], steps: ['Generated step.'], tools: [] }],
  };

  const shows = () => {
    const value: Record<string, unknown> = { symptom: pick(symptoms).id };
    const r = rnd();
    if (r < 0.15) value.band = [pick(THROTTLE_BANDS)];
    else if (r < 0.2) value.engine = [pick(ENGINE_TEMPS)];
    else if (r < 0.25) value.where = [pick(TRACK_POSITIONS)];
    return { fact: 'symptoms', operator: 'shows', value };
  };
  const setupCondition = () =>
    pick([
      () => ({ fact: 'airScrewTurnsOut', operator: 'greaterThanInclusive', value: round(1 + rnd() * 3, 0.25) }),
      () => ({ fact: 'airScrewVsUsual', operator: 'equal', value: pick(['below', 'within', 'above']) }),
      () => ({ fact: 'mainJet', operator: 'lessThan', value: round(150 + rnd() * 50, 2.5) }),
      () => ({ fact: 'idleScrew', operator: 'equal', value: pick(['set', 'backed-off']) }),
      () => ({ fact: 'foamAgeDays', operator: 'greaterThanInclusive', value: Math.floor(rnd() * 500) }),
      () => ({ fact: 'ventLinesFitted', operator: 'equal', value: rnd() < 0.5 }),
      () => ({ fact: 'carburettorKind', operator: 'equal', value: pick(['pump-around', 'float-valve']) }),
    ])();
  const densityCondition = () =>
    rnd() < 0.5
      ? { fact: 'densityChangePct', operator: 'greaterThanInclusive', value: round(1 + rnd() * 6, 0.5) }
      : { fact: 'densityChangePct', operator: 'lessThanInclusive', value: -round(1 + rnd() * 6, 0.5) };
  const lr = () => {
    const r = rnd();
    return r < 0.15 ? round(0.1 + rnd() * 0.8, 0.05) : round(1.2 + rnd() * 6, 0.1);
  };
  const likelihood = (reason: string) => ({ type: 'likelihood', params: { cause: pick(causes).id, lr: lr(), reason } });

  const files: Record<string, { theme: string; description: string; rules: unknown[] }> = {};
  const perFile = 250;
  for (let i = 0; i < size.rules; i++) {
    const r = rnd();
    let rule: { conditions: unknown; event: unknown };
    if (r < 0.75) rule = { conditions: { all: [shows()] }, event: likelihood('Generated symptom rule') };
    else if (r < 0.85) rule = { conditions: { all: [shows(), setupCondition()] }, event: likelihood('Generated symptom and setup rule') };
    else if (r < 0.91) rule = { conditions: { all: [shows(), densityCondition()] }, event: likelihood('Generated air density rule') };
    else if (r < 0.97) rule = { conditions: { all: [rnd() < 0.7 ? setupCondition() : densityCondition()] }, event: likelihood('Generated setup rule') };
    else {
      const check = pick(checks).id;
      const stop = rnd() < 0.2;
      rule = {
        conditions: { all: [{ fact: 'checkResults', operator: 'resultIs', value: { check, result: stop ? 'fault-found' : pick(['fault-found', 'looks-fine']) } }] },
        event: stop ? { type: 'stop', params: { check, reason: 'Generated stop finding.' } } : likelihood('Generated check rule'),
      };
    }
    const file = `rules/gen-${String(Math.floor(i / perFile)).padStart(2, '0')}.json`;
    files[file] ??= { theme: 'Generated', description: 'Generated for the bench.', rules: [] };
    files[file].rules.push({ name: `gen-rule-${i}`, ...rule });
  }
  return { catalog, ruleFiles: files };
}

/** Random rank requests against a generated catalog (no stop findings: those end the plan early). */
export function generateRequests(source: RulesetSource, count: number, seed = 2): RankRequest[] {
  const rnd = prng(seed);
  const catalog = source.catalog as { symptoms: { id: string }[]; checks: { id: string }[] };
  const stopChecks = new Set<string>();
  for (const file of Object.values(source.ruleFiles) as { rules: { event: { type: string; params: { check?: string } } }[] }[]) {
    for (const r of file.rules) if (r.event.type === 'stop' && r.event.params.check) stopChecks.add(r.event.params.check);
  }
  const pick = <T>(list: readonly T[]): T => list[Math.floor(rnd() * list.length)];
  const checks = catalog.checks.filter((c) => !stopChecks.has(c.id));
  return Array.from({ length: count }, () => {
    const symptoms = Array.from({ length: 2 + Math.floor(rnd() * 3) }, () =>
      rnd() < 0.5 ? pick(catalog.symptoms).id : { id: pick(catalog.symptoms).id, band: pick(THROTTLE_BANDS), where: pick(TRACK_POSITIONS) },
    );
    const results: Record<string, 'fault-found' | 'looks-fine' | 'not-checked'> = {};
    for (let k = 0; k < 2; k++) results[pick(checks).id] = pick(['looks-fine', 'looks-fine', 'not-checked'] as const);
    return {
      symptoms,
      setup: {
        carburettorKind: pick(['pump-around', 'float-valve'] as const),
        airScrewTurnsOut: round(rnd() * 4, 0.25),
        mainJet: round(160 + rnd() * 40, 2.5),
        idleScrew: pick(['set', 'backed-off'] as const),
        foamFittedDate: '2026-01-15',
        ventLinesFitted: rnd() < 0.8,
      },
      conditions: { densityChangePct: round(-8 + rnd() * 16, 0.5) },
      results,
      asOf: '2026-12-01',
    };
  });
}
