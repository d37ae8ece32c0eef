import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CHECK_RESULT_VALUES, ENGINE_TEMPS, THROTTLE_BANDS, TRACK_POSITIONS, type RankRequest } from '@fuelwright/shared';
import { buildDiagnosisEngine } from './engine.js';
import { createPlainEvaluator } from './plain.js';
import { RankRequestError } from './request.js';
import { SHIPPED_RULESET_SOURCES, SHIPPED_RULESET_VERSION } from './ruleset.js';
import { toRulesetSource, validateRuleset } from './validate.js';
import { generateRequests, generateRulesetSource } from './generate-ruleset.js';
import { AS_OF, engine, ids, plain, prob, rank, ruleset } from './test-support/shipped.js';
import { HAZARD_CAUTIONS, GROUP_HAZARDS } from './model.js';

const catalog = ruleset.catalog;
const symptomIds = catalog.symptoms.map((s) => s.id);
const checkIds = catalog.checks.map((c) => c.id);

/** Random valid requests against the shipped catalog. */
const requestArb: fc.Arbitrary<RankRequest> = fc.record({
  symptoms: fc.array(
    fc.oneof(
      fc.constantFrom(...symptomIds),
      fc.record(
        {
          id: fc.constantFrom(...symptomIds),
          band: fc.oneof(fc.constantFrom(...THROTTLE_BANDS), fc.uniqueArray(fc.constantFrom(...THROTTLE_BANDS), { minLength: 1, maxLength: 2 })),
          engine: fc.constantFrom(...ENGINE_TEMPS),
          where: fc.uniqueArray(fc.constantFrom(...TRACK_POSITIONS), { minLength: 1, maxLength: 2 }),
        },
        { requiredKeys: ['id'] },
      ),
    ),
    { maxLength: 4 },
  ),
  setup: fc.record(
    {
      carburettorKind: fc.constantFrom('pump-around' as const, 'float-valve' as const),
      mainJet: fc.integer({ min: 60, max: 80 }).map((n) => n * 2.5),
      pilotJet: fc.integer({ min: 12, max: 18 }).map((n) => n * 2.5),
      airScrewTurnsOut: fc.integer({ min: 0, max: 16 }).map((n) => n / 4),
      idleScrew: fc.constantFrom('set' as const, 'backed-off' as const),
      foamFittedDate: fc.constantFrom('2024-05-01', '2026-06-01', '2026-11-20'),
      lastRebuildDate: fc.constantFrom('2025-01-01', '2026-11-25'),
      premixRatio: fc.constantFrom(10, 20, 32, 60),
      ventLinesFitted: fc.boolean(),
      ventLinesRoutedUp: fc.boolean(),
    },
    { requiredKeys: [] },
  ),
  conditions: fc.record({ densityChangePct: fc.integer({ min: -16, max: 16 }).map((n) => n / 2), fuelAgeDays: fc.integer({ min: 0, max: 60 }) }, { requiredKeys: [] }),
  results: fc.dictionary(fc.constantFrom(...checkIds), fc.constantFrom(...CHECK_RESULT_VALUES), { maxKeys: 4 }),
  asOf: fc.constant(AS_OF),
});

describe('json-rules-engine path and plain evaluator agree', () => {
  it('on random requests against the shipped ruleset: same fired rules, same response', async () => {
    const unindexed = buildDiagnosisEngine(ruleset, { indexed: false, shareConditions: false });
    const plainAll = createPlainEvaluator(ruleset, { indexed: false });
    await fc.assert(
      fc.asyncProperty(requestArb, async (req) => {
        const fired = await engine.firedRules(req);
        expect(plain.firedRules(req)).toEqual(fired);
        // The index and the shared conditions change nothing: every rule, evaluated separately, fires the same.
        expect(await unindexed.firedRules(req)).toEqual(fired);
        expect(plainAll.firedRules(req)).toEqual(fired);
        expect(plain.rank(req)).toEqual(await engine.rank(req));
      }),
      { numRuns: 100 },
    );
  }, 60_000);

  it('on a generated ruleset of 2,000 rules over 200 causes', async () => {
    const base = SHIPPED_RULESET_SOURCES[SHIPPED_RULESET_VERSION].catalog as { cautions: unknown[]; groups: unknown[] };
    const source = generateRulesetSource({ rules: 2000, causes: 200, symptoms: 160, checks: 300 }, 3, base);
    const generated = validateRuleset(source);
    expect(generated.rules).toHaveLength(2000);
    const genEngine = buildDiagnosisEngine(generated);
    const genPlain = createPlainEvaluator(generated, { indexed: false });
    for (const req of generateRequests(source, 25, 4)) {
      const fired = await genEngine.firedRules(req);
      expect(genPlain.firedRules(req)).toEqual(fired);
      expect(genPlain.rank(req)).toEqual(await genEngine.rank(req));
    }
  }, 60_000);

  it('concurrent requests on one engine give the same answers as one at a time', async () => {
    const requests = fc.sample(requestArb, { numRuns: 40, seed: 11 });
    const oneByOne = [];
    for (const r of requests) oneByOne.push(await engine.rank(r));
    const together = await Promise.all(requests.map((r) => engine.rank(r)));
    expect(together).toEqual(oneByOne);
  });

  it('a failing request does not block the queue', async () => {
    await expect(engine.rank({ symptoms: ['no-such-symptom'] })).rejects.toBeInstanceOf(RankRequestError);
    expect((await engine.rank({ symptoms: ['hesitation'] })).causes.length).toBeGreaterThan(0);
  });
});

describe('rank request validation', () => {
  it('lists unknown ids per field and gives messages per dotted path', () => {
    const v = engine.validateRankRequest({
      symptoms: ['hesitation', 'engine-explodes', { id: 'wobbles' }],
      results: { 'foam-inspect': 'looks-fine', 'x-ray': 'fault-found' },
    });
    expect(v.ok).toBe(false);
    expect(v.unknown).toEqual({ symptoms: ['engine-explodes', 'wobbles'], checks: ['x-ray'] });
    expect(v.fields).toEqual({
      'symptoms.1': ['unknown symptom "engine-explodes"'],
      'symptoms.2.id': ['unknown symptom "wobbles"'],
      'results.x-ray': ['unknown check "x-ray"'],
    });
    expect(v.message).toBe('Invalid rank request: unknown symptoms: engine-explodes, wobbles; unknown check: x-ray');
  });

  it('rejects bad shapes and out-of-range setup values', () => {
    const v = engine.validateRankRequest({
      symptoms: [{ id: 'hesitation', band: 'half' }],
      setup: { mainJet: 20, needleClipGroove: 2.5, airScrewTurnsOut: 9, carburettorKind: 'diaphragm', foamFittedDate: 'last spring' },
      results: { 'foam-inspect': 'maybe' },
      extra: true,
    });
    expect(v.ok).toBe(false);
    expect(Object.keys(v.fields).sort()).toEqual([
      '(body)',
      'results.foam-inspect',
      'setup.airScrewTurnsOut',
      'setup.carburettorKind',
      'setup.foamFittedDate',
      'setup.mainJet',
      'setup.needleClipGroove',
      'symptoms.0',
    ].sort());
    expect(v.fields['setup.mainJet']).toEqual(['must be at least 50']);
    expect(engine.validateRankRequest({}).fields).toHaveProperty('symptoms');
    expect(engine.validateRankRequest(null).ok).toBe(false);
  });

  it('accepts a good request, merges repeated symptoms and reads nulls as unknown', () => {
    const v = engine.validateRankRequest({
      symptoms: [{ id: 'hesitation', band: 'closed' }, { id: 'hesitation', band: ['closed', 'quarter-to-three-quarters'], where: 'corner-exit' }],
      setup: { mainJet: null, airScrewTurnsOut: 1.5, ventLinesFitted: null },
      conditions: { densityChangePct: 2, today: { densityKgM3: 1.2, temperatureC: null } },
    });
    expect(v.ok).toBe(true);
    expect(v.request!.symptoms).toEqual([{ id: 'hesitation', bands: ['closed', 'quarter-to-three-quarters'], engine: [], where: ['corner-exit'] }]);
    expect(v.request!.setup).toEqual({ airScrewTurnsOut: 1.5 });
    expect(v.request!.conditions).toEqual({ densityChangePct: 2, today: { densityKgM3: 1.2 } });
  });

  it('rank throws a RankRequestError carrying the validation', async () => {
    const err = await engine.rank({ symptoms: ['nope'] }).catch((e) => e);
    expect(err).toBeInstanceOf(RankRequestError);
    expect((err as RankRequestError).validation.unknown.symptoms).toEqual(['nope']);
  });
});

describe('response and catalog', () => {
  it('the response is plain JSON, carries the version, and its probabilities sum to one', async () => {
    const res = await rank({ symptoms: ['bog-on-acceleration'] });
    expect(JSON.parse(JSON.stringify(res))).toEqual(res);
    expect(res.version).toBe('1.0.1');
    const total = res.causes.reduce((s, c) => s + c.probability, 0) + res.somethingElse.probability;
    expect(total).toBeCloseTo(1, 12);
    for (let i = 1; i < res.causes.length; i++) expect(res.causes[i - 1].probability).toBeGreaterThanOrEqual(res.causes[i].probability);
  });

  it('the catalog resolves cautions, marks stop checks and lists groups with their opening minutes', () => {
    const c = engine.catalog;
    expect(c.version).toBe('1.0.1');
    expect(c.checks.filter((k) => k.stopOnFault).map((k) => k.id).sort()).toEqual(['fuel-leak-look', 'piston-look', 'plug-reads-lean', 'throttle-return']);
    const throttle = c.checks.find((k) => k.id === 'throttle-return')!;
    expect(throttle.cautions[0]).toMatchObject({ id: 'throttle-stop', severity: 'stop' });
    expect(c.groups.map((g) => [g.id, g.openingMinutes > 0])).toEqual([
      ['outside', false],
      ['fuel-lines', true],
      ['float-bowl', true],
      ['carb-top', true],
      ['spark-plug', true],
    ]);
    expect(c.throttleBands.map((b) => b.id)).toEqual([...THROTTLE_BANDS]);
    expect(Object.isFrozen(c)).toBe(true);
  });

  it('every check that handles fuel, a hot engine, a running engine or the throttle carries its cautions', () => {
    for (const check of catalog.checks) {
      const hazards = new Set([...check.hazards, ...(GROUP_HAZARDS[check.group] ?? [])]);
      for (const h of hazards) for (const needed of HAZARD_CAUTIONS[h]) expect(check.cautions, `${check.id} (${h})`).toContain(needed);
    }
    // And the hazards are declared where the steps say so.
    const running = catalog.checks.filter((k) => /run a few laps|start it|engine warm/i.test(k.steps.join(' ')));
    expect(running.length).toBeGreaterThan(3);
    for (const k of running) expect(k.cautions, k.id).toContain('throttle-snap-back');
    const fuelHandling = catalog.checks.filter((k) => /fuel/i.test(k.steps.join(' ')));
    expect(fuelHandling.map((k) => k.id)).toEqual(expect.arrayContaining(['premix-record', 'vent-lines-look', 'fuel-sample', 'foam-inspect']));
    for (const k of fuelHandling) {
      expect(k.hazards, k.id).toContain('fuel');
      expect(k.cautions, k.id).toContain('fuel-flammable');
    }
  });

  it('the throttle check leads the plan until it is answered', async () => {
    const res = await rank({ symptoms: ['rich-blubber'] });
    expect(res.plan[0]).toMatchObject({ checkId: 'throttle-return', safetyFirst: true });
    const after = await rank({ symptoms: ['rich-blubber'], results: { 'throttle-return': 'looks-fine' } });
    expect(after.plan[0].checkId).not.toBe('throttle-return');
    expect(after.plan.every((s) => !s.safetyFirst)).toBe(true);
  });

  it('each group\'s opening minutes are counted once, on its first step', async () => {
    const res = await rank({ symptoms: ['sporadic-running', 'bog-on-acceleration'], setup: { carburettorKind: 'pump-around' } });
    const seen = new Set<string>();
    for (const step of res.plan) {
      const opening = catalog.groups.find((g) => g.id === step.group)!.openingMinutes;
      expect(step.openingMinutes).toBe(seen.has(step.group) ? 0 : opening);
      seen.add(step.group);
    }
  });
});

describe('stop findings', () => {
  const cases: [string, string][] = [
    ['throttle-return', 'throttle does not snap back'],
    ['fuel-leak-look', 'Fuel is leaking near the exhaust'],
    ['plug-reads-lean', 'white or blistered'],
    ['piston-look', 'piston is scuffed'],
  ];
  for (const [checkId, words] of cases) {
    it(`"fault found" on ${checkId} ends the walk-through`, async () => {
      const res = await rank({ symptoms: ['lean-top-end'], results: { [checkId]: 'fault-found' } });
      expect(res.stop).toBeDefined();
      expect(res.stop!.checkId).toBe(checkId);
      expect(res.stop!.reason).toContain(words);
      expect(res.stop!.reason).toContain('Do not drive; see a qualified engine builder.');
      expect(res.stop!.reason).toContain("local rules and the track's technical inspection");
      expect(res.plan).toEqual([]);
    });
  }

  it('"looks fine" on the same checks does not stop', async () => {
    const res = await rank({ symptoms: ['lean-top-end'], results: Object.fromEntries(cases.map(([c]) => [c, 'looks-fine'])) });
    expect(res.stop).toBeUndefined();
    expect(res.plan.length).toBeGreaterThan(0);
  });
});

describe('a replaceable ruleset', () => {
  it('a re-fitted version (new prior and likelihood ratio) builds and ranks by its own numbers', async () => {
    const source = toRulesetSource(ruleset) as ReturnType<typeof toRulesetSource> & { catalog: any; ruleFiles: any };
    source.catalog.version = '1.1.0';
    source.catalog.causes.find((c: { id: string }) => c.id === 'choke-left-on').prior = 0.2;
    const rule = source.ruleFiles['rules/starting.json'].rules.find((r: { name: string }) => r.name === 'rich-blubber--choke-left-on');
    rule.event.params.lr = 6;
    const refit = buildDiagnosisEngine(validateRuleset(source));
    const req = { symptoms: ['rich-blubber'], asOf: AS_OF };
    const before = await engine.rank(req);
    const after = await refit.rank(req);
    expect(after.version).toBe('1.1.0');
    expect(ids(after, 1)).toEqual(['choke-left-on']);
    expect(prob(after, 'choke-left-on')).toBeGreaterThan(prob(before, 'choke-left-on'));
    // The shipped engine is untouched.
    expect((await engine.rank(req)).causes).toEqual(before.causes);
  });

  it('uses the date given, or the request\'s asOf, for foam age', async () => {
    const req = { symptoms: ['sporadic-running'], setup: { carburettorKind: 'pump-around' as const, foamFittedDate: '2026-01-01' } };
    const early = await engine.rank(req, { now: new Date('2026-02-01') });
    const late = await engine.rank({ ...req, asOf: '2027-06-01' });
    expect(prob(late, 'foam-degraded')).toBeGreaterThan(prob(early, 'foam-degraded'));
  });
});
