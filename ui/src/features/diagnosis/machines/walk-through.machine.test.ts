/**
 * The walk-through machine with fake actors (machine.provide): every path through it. The fakes
 * are plumbing with neutral ids (check-a, cause-x...): these tests check the flow (what is sent,
 * which screen comes next, what is kept), not any fact of the trade.
 */
import { describe, expect, it } from 'vitest';
import { createActor, fromPromise, waitFor, type Snapshot } from 'xstate';
import type {
  CaseDto,
  CheckResultValue,
  CorrectCaseFactsRequest,
  OpenCaseRequest,
  PlanStep,
  RankRequest,
  RankResponse,
  RecordCheckResultRequest,
  ResolveCaseRequest,
  SetupDto,
  SymptomReport,
} from '@fuelwright/shared';
import { densityChangePct } from '@fuelwright/shared';
import { ApiError } from '../../../lib/api-client';
import { emptyConditionsDraft, type ConditionsDraft, type ReferenceSession } from './conditions-draft';
import { walkThroughMachine, type WalkThroughInput } from './walk-through.machine';

// ---------------------------------------------------------------------------------------------
// Fakes
// ---------------------------------------------------------------------------------------------

const CAUTION = { id: 'caution-1', severity: 'caution' as const, title: 'Hot parts', text: 'Let it cool first.' };

/** The plan the fake ranking works from, in this order. check-a and check-stop carry cautions. */
const CHECKS: { id: string; cautions: boolean }[] = [
  { id: 'check-a', cautions: true },
  { id: 'check-b', cautions: false },
  { id: 'check-c', cautions: false },
  { id: 'check-stop', cautions: true },
];
const CAUTION_CHECK_IDS = CHECKS.filter((c) => c.cautions).map((c) => c.id);

/**
 * A stand-in for the ranking: cause-x starts at 0.5 and halves with every "looks fine", the plan
 * is every check without a result, and a fault found on check-stop is a stop finding.
 */
function fakeRank(results: Record<string, CheckResultValue> = {}): RankResponse {
  const fine = Object.values(results).filter((r) => r === 'looks-fine').length;
  const x = 0.5 / 2 ** fine;
  const stop = results['check-stop'] === 'fault-found';
  const plan: PlanStep[] = stop
    ? []
    : CHECKS.filter((c) => !(c.id in results)).map((c) => ({
        checkId: c.id,
        label: `Label of ${c.id}`,
        group: 'outside',
        minutes: 2,
        openingMinutes: 0,
        cautions: c.cautions ? [CAUTION] : [],
        findProbability: 0.1,
        causes: ['cause-x'],
        safetyFirst: false,
      }));
  return {
    version: 'test',
    causes: [
      { id: 'cause-x', label: 'Cause X', probability: x, prior: 0.1, logOdds: 0, reasons: [], fixes: [] },
      { id: 'cause-y', label: 'Cause Y', probability: 0.3, prior: 0.1, logOdds: 0, reasons: [], fixes: [] },
    ],
    somethingElse: { label: 'Something else', probability: 0.2 },
    excluded: [],
    plan,
    expectedMinutes: plan.length * 2,
    cautions: [],
    ...(stop ? { stop: { reason: 'Do not drive; see a qualified engine builder.', checkId: 'check-stop', ruleId: 'r' } } : {}),
  };
}

/** An in-memory stand-in for the case routes, answering as the server does (409 once finished). */
class FakeCaseServer {
  cases = new Map<string, CaseDto>();
  calls: { name: string; input: unknown }[] = [];
  private seq = 0;

  private make(kartId: string, symptoms: SymptomReport[], setup: CaseDto['setup']): CaseDto {
    const id = `case-${++this.seq}`;
    const rank = fakeRank();
    return {
      id,
      kartId,
      kartName: 'Kart',
      ownerId: 'u1',
      ownerName: 'Racer',
      state: 'open',
      rulesetVersion: 'test',
      symptomIds: symptoms.map((s) => s.id),
      topCauseId: 'cause-x',
      topCauseProbability: 0.5,
      openedAt: '2026-11-30T10:00:00.000Z',
      updatedAt: '2026-11-30T10:00:00.000Z',
      symptoms,
      setup,
      conditions: {},
      results: [],
      rank,
      openingRank: rank,
      resolution: null,
      stop: null,
      abandonedReason: null,
      recommendations: [],
      events: [],
    };
  }

  private mustBeOpen(id: string): CaseDto {
    const found = this.cases.get(id);
    if (!found) throw new ApiError(404, 'No such case.');
    if (found.state !== 'open') throw new ApiError(409, `This case is ${found.state}; it no longer takes that step.`);
    return found;
  }

  open(input: OpenCaseRequest): CaseDto {
    this.calls.push({ name: 'openCase', input });
    const symptoms = input.symptoms.map((s) => (typeof s === 'string' ? { id: s } : s));
    const dto = this.make(input.kartId, symptoms, { ...(input.setup ?? { mainJet: 180 }), carburettorKind: 'pump-around' });
    this.cases.set(dto.id, dto);
    return structuredClone(dto);
  }

  load(caseId: string): CaseDto {
    this.calls.push({ name: 'loadCase', input: caseId });
    const found = this.cases.get(caseId);
    if (!found) throw new ApiError(404, 'No such case.');
    return structuredClone(found);
  }

  record(input: { caseId: string } & RecordCheckResultRequest): CaseDto {
    this.calls.push({ name: 'recordResult', input });
    const c = this.mustBeOpen(input.caseId);
    c.results = [...c.results.filter((r) => r.checkId !== input.checkId), { checkId: input.checkId, result: input.result, note: input.note ?? '', at: 'now', by: 'u1' }];
    c.rank = fakeRank(Object.fromEntries(c.results.map((r) => [r.checkId, r.result])));
    if (c.rank.stop) {
      c.state = 'stopped';
      c.stop = c.rank.stop;
    }
    return structuredClone(c);
  }

  symptoms(input: { caseId: string; symptoms: SymptomReport[] }): CaseDto {
    this.calls.push({ name: 'reportSymptoms', input });
    const c = this.mustBeOpen(input.caseId);
    c.symptoms = input.symptoms;
    return structuredClone(c);
  }

  /** PUT /api/cases/:id/facts: each part given replaces the case's (the kind stays the kart's); ranked again. */
  correct(input: { caseId: string } & CorrectCaseFactsRequest): CaseDto {
    this.calls.push({ name: 'correctFacts', input });
    const c = this.mustBeOpen(input.caseId);
    if (input.setup) c.setup = { ...input.setup, carburettorKind: c.setup.carburettorKind };
    if (input.conditions) c.conditions = input.conditions;
    // The fake ranking: a main jet of 200 or more makes cause-y the likelier (plumbing, not a trade fact).
    const rank = fakeRank(Object.fromEntries(c.results.map((r) => [r.checkId, r.result])));
    if ((c.setup.mainJet ?? 0) >= 200) rank.causes = rank.causes.map((cause) => ({ ...cause, probability: cause.id === 'cause-y' ? 0.6 : 0.1 }));
    c.rank = rank;
    return structuredClone(c);
  }

  resolve(input: { caseId: string } & ResolveCaseRequest): CaseDto {
    this.calls.push({ name: 'resolveCase', input });
    const c = this.mustBeOpen(input.caseId);
    c.state = 'resolved';
    c.resolution = { causeId: input.causeId, fix: input.fix, note: input.note ?? '', at: 'now', by: 'u1' };
    return structuredClone(c);
  }

  abandon(input: { caseId: string; reason?: string }): CaseDto {
    this.calls.push({ name: 'abandonCase', input });
    const c = this.mustBeOpen(input.caseId);
    c.state = 'abandoned';
    c.abandonedReason = input.reason ?? '';
    return structuredClone(c);
  }
}

const LATEST_SETUP: SetupDto = {
  id: 'setup-1',
  kartId: 'kart-1',
  takenOn: '2026-11-21',
  note: '',
  createdAt: '2026-11-21T10:00:00.000Z',
  changedFields: [],
  mainJet: 182.5,
  needleClipGroove: 3,
  ventLinesFitted: true,
};

interface Harness {
  rankRequests: RankRequest[];
  server: FakeCaseServer;
  /** Make the next call of this actor fail with this error. */
  failNext: Partial<Record<'rank' | 'recordResult' | 'loadCase' | 'resolveCase' | 'correctFacts', unknown>>;
}

function provided(h: Harness) {
  const failing = (name: keyof Harness['failNext']) => {
    if (name in h.failNext) {
      const error = h.failNext[name];
      delete h.failNext[name];
      throw error;
    }
  };
  return walkThroughMachine.provide({
    actors: {
      rank: fromPromise<RankResponse, RankRequest>(async ({ input }) => {
        h.rankRequests.push(input);
        failing('rank');
        return fakeRank(input.results);
      }),
      loadKartSetup: fromPromise<SetupDto | null, { kartId: string }>(async ({ input }) => (input.kartId === 'kart-1' ? LATEST_SETUP : null)),
      openCase: fromPromise<CaseDto, OpenCaseRequest>(async ({ input }) => h.server.open(input)),
      loadCase: fromPromise<CaseDto, { caseId: string }>(async ({ input }) => {
        failing('loadCase');
        return h.server.load(input.caseId);
      }),
      reportSymptoms: fromPromise<CaseDto, { caseId: string; symptoms: SymptomReport[] }>(async ({ input }) => h.server.symptoms(input)),
      correctFacts: fromPromise<CaseDto, { caseId: string } & CorrectCaseFactsRequest>(async ({ input }) => {
        failing('correctFacts');
        return h.server.correct(input);
      }),
      recordResult: fromPromise<CaseDto, { caseId: string } & RecordCheckResultRequest>(async ({ input }) => {
        failing('recordResult');
        return h.server.record(input);
      }),
      resolveCase: fromPromise<CaseDto, { caseId: string } & ResolveCaseRequest>(async ({ input }) => {
        failing('resolveCase');
        return h.server.resolve(input);
      }),
      abandonCase: fromPromise<CaseDto, { caseId: string; reason?: string }>(async ({ input }) => h.server.abandon(input)),
    },
  });
}

function harness(): Harness {
  return { rankRequests: [], server: new FakeCaseServer(), failNext: {} };
}

function start(h: Harness, input: Partial<WalkThroughInput> = {}) {
  const actor = createActor(provided(h), { input: { mode: 'quick', cautionCheckIds: CAUTION_CHECK_IDS, ...input } });
  actor.start();
  return actor;
}

type Actor = ReturnType<typeof start>;

/** A new actor from a stored snapshot (input is required by the types but unused when restoring). */
function restore(h: Harness, stored: string): Actor {
  return createActor(provided(h), {
    snapshot: JSON.parse(stored) as Persisted,
    input: { mode: 'quick', cautionCheckIds: [] },
  });
}
type Persisted = Snapshot<unknown>;

const atRest = (actor: Actor) => waitFor(actor, (s) => !s.hasTag('busy'), { timeout: 1000 });

const BOG: SymptomReport = { id: 'symptom-1', band: ['up-to-quarter'], engine: ['warm'], where: ['corner-exit'] };

/** Quick mode: symptoms and carburettor given, ranked, at the causes and plan. */
async function quickAtRanking(h: Harness): Promise<Actor> {
  const actor = start(h);
  actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG, { id: 'symptom-2' }] });
  actor.send({ type: 'INTAKE.CARBURETTOR', carburettorKind: 'pump-around' });
  actor.send({ type: 'INTAKE.SUBMIT' });
  await atRest(actor);
  expect(actor.getSnapshot().value).toEqual({ ranking: 'idle' });
  return actor;
}

/** Records a result on the current check (acknowledging its cautions first when it has any). */
async function record(actor: Actor, result: CheckResultValue, note?: string) {
  if (actor.getSnapshot().matches({ check: 'cautions' })) actor.send({ type: 'CAUTIONS.ACKNOWLEDGE' });
  expect(actor.getSnapshot().matches({ check: 'steps' })).toBe(true);
  actor.send({ type: 'CHECK.RECORD', result, note });
  await atRest(actor);
}

const current = (actor: Actor) => actor.getSnapshot().context.currentCheckId;

// ---------------------------------------------------------------------------------------------
// Paths
// ---------------------------------------------------------------------------------------------

describe('walk-through machine, quick mode', () => {
  it('happy path: intake -> causes and plan -> cautions first -> steps -> re-ranked -> resolve -> summary', async () => {
    const h = harness();
    const actor = start(h);
    expect(actor.getSnapshot().value).toEqual({ intake: 'editing' });

    // Nothing is sent until a symptom and the carburettor kind are given.
    actor.send({ type: 'INTAKE.SUBMIT' });
    expect(actor.getSnapshot().context.formErrors).toMatchObject({ symptoms: expect.any(String), carburettorKind: expect.any(String) });
    expect(h.rankRequests).toHaveLength(0);

    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG, { id: 'symptom-2', band: [] }] });
    actor.send({ type: 'INTAKE.CARBURETTOR', carburettorKind: 'pump-around' });
    actor.send({ type: 'INTAKE.SETUP', field: 'mainJet', value: '185' });
    actor.send({ type: 'INTAKE.SETUP', field: 'airScrewTurnsOut', value: '1,5' });
    actor.send({ type: 'INTAKE.SETUP', field: 'ventLinesFitted', value: 'yes' });
    expect(actor.getSnapshot().context.formErrors).toEqual({});
    actor.send({ type: 'INTAKE.SUBMIT' });
    expect(actor.getSnapshot().hasTag('busy')).toBe(true);
    await atRest(actor);

    expect(h.rankRequests[0]).toEqual({
      symptoms: [BOG, { id: 'symptom-2' }],
      setup: { mainJet: 185, airScrewTurnsOut: 1.5, ventLinesFitted: true, carburettorKind: 'pump-around' },
    });
    let snap = actor.getSnapshot();
    expect(snap.value).toEqual({ ranking: 'idle' });
    expect(snap.context.rank?.plan.map((s) => s.checkId)).toEqual(['check-a', 'check-b', 'check-c', 'check-stop']);

    actor.send({ type: 'CHECKS.START' });
    expect(actor.getSnapshot().value).toEqual({ check: 'cautions' });
    expect(current(actor)).toBe('check-a');
    // The steps (and recording) stay closed until the cautions are acknowledged.
    actor.send({ type: 'CHECK.RECORD', result: 'looks-fine' });
    expect(actor.getSnapshot().value).toEqual({ check: 'cautions' });
    expect(h.rankRequests).toHaveLength(1);
    actor.send({ type: 'CAUTIONS.ACKNOWLEDGE' });
    expect(actor.getSnapshot().value).toEqual({ check: 'steps' });
    actor.send({ type: 'CHECK.RECORD', result: 'looks-fine', note: '  springy, all there  ' });
    await atRest(actor);

    snap = actor.getSnapshot();
    expect(snap.value).toEqual({ ranking: 'idle' });
    expect(h.rankRequests[1].results).toEqual({ 'check-a': 'looks-fine' });
    expect(snap.context.results).toEqual([{ checkId: 'check-a', result: 'looks-fine', note: 'springy, all there' }]);
    expect(snap.context.previousCauses?.find((c) => c.id === 'cause-x')?.probability).toBe(0.5);
    expect(snap.context.rank?.causes.find((c) => c.id === 'cause-x')?.probability).toBe(0.25);
    expect(snap.context.lastRecorded?.checkId).toBe('check-a');
    expect(snap.context.rank?.plan.map((s) => s.checkId)).toEqual(['check-b', 'check-c', 'check-stop']);

    // check-b has no cautions: straight to its steps.
    actor.send({ type: 'CHECKS.START' });
    expect(actor.getSnapshot().value).toEqual({ check: 'steps' });
    await record(actor, 'fault-found');

    actor.send({ type: 'RESOLVE.START' });
    expect(actor.getSnapshot().value).toEqual({ resolve: 'editing' });
    actor.send({ type: 'RESOLVE.SUBMIT', causeId: 'cause-x', fix: '  ' });
    expect(actor.getSnapshot().value).toEqual({ resolve: 'editing' });
    expect(actor.getSnapshot().context.formErrors.fix).toBeDefined();
    actor.send({ type: 'RESOLVE.SUBMIT', causeId: 'cause-x', fix: 'Fitted new part', note: 'ran clean after' });
    snap = actor.getSnapshot();
    expect(snap.value).toBe('summary');
    expect(snap.context.resolution).toEqual({ causeId: 'cause-x', fix: 'Fitted new part', note: 'ran clean after' });
    expect(snap.context.results.map((r) => r.checkId)).toEqual(['check-a', 'check-b']);

    // A new quick diagnosis starts from an empty intake.
    actor.send({ type: 'RESTART' });
    expect(actor.getSnapshot().value).toEqual({ intake: 'editing' });
    expect(actor.getSnapshot().context.results).toEqual([]);
    expect(actor.getSnapshot().context.symptoms).toEqual([]);
  });

  it('setup values out of range are caught before anything is sent', async () => {
    const h = harness();
    const actor = start(h);
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG] });
    actor.send({ type: 'INTAKE.CARBURETTOR', carburettorKind: 'float-valve' });
    // Ranges from shared/setup.ts (main jet 50 to 400, clip groove 1 to 7).
    actor.send({ type: 'INTAKE.SETUP', field: 'mainJet', value: '900' });
    actor.send({ type: 'INTAKE.SETUP', field: 'needleClipGroove', value: '2.5' });
    actor.send({ type: 'INTAKE.SETUP', field: 'foamFittedDate', value: '2999-01-01' });
    actor.send({ type: 'INTAKE.SUBMIT' });
    const { formErrors } = actor.getSnapshot().context;
    expect(Object.keys(formErrors).sort()).toEqual(['setup.foamFittedDate', 'setup.mainJet', 'setup.needleClipGroove']);
    expect(h.rankRequests).toHaveLength(0);
    // Correcting a field clears its message.
    actor.send({ type: 'INTAKE.SETUP', field: 'mainJet', value: '180' });
    expect(actor.getSnapshot().context.formErrors['setup.mainJet']).toBeUndefined();
  });

  it('back: goes to the previous check, and recording again replaces its result', async () => {
    const h = harness();
    const actor = await quickAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine'); // check-a
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine'); // check-b
    actor.send({ type: 'CHECKS.START' });
    expect(current(actor)).toBe('check-c');

    actor.send({ type: 'CHECK.BACK' });
    expect(current(actor)).toBe('check-b');
    expect(actor.getSnapshot().value).toEqual({ check: 'steps' });
    actor.send({ type: 'CHECK.BACK' });
    // check-a's cautions were acknowledged already: its steps show again at once.
    expect(current(actor)).toBe('check-a');
    expect(actor.getSnapshot().value).toEqual({ check: 'steps' });
    await record(actor, 'fault-found', 'was soaked after all');

    const snap = actor.getSnapshot();
    expect(snap.context.results).toEqual([
      { checkId: 'check-b', result: 'looks-fine', note: '' },
      { checkId: 'check-a', result: 'fault-found', note: 'was soaked after all' },
    ]);
    expect(h.rankRequests.at(-1)?.results).toEqual({ 'check-a': 'fault-found', 'check-b': 'looks-fine' });
    // One "looks fine" left: cause-x at 0.5 / 2.
    expect(snap.context.rank?.causes[0].probability).toBe(0.25);

    // Back from the causes opens the last recorded check; Back from the first check returns to the causes.
    actor.send({ type: 'CHECK.BACK' });
    expect(current(actor)).toBe('check-a');
    actor.send({ type: 'CHECK.BACK' });
    expect(current(actor)).toBe('check-b');
    actor.send({ type: 'CHECK.BACK' });
    expect(actor.getSnapshot().value).toEqual({ ranking: 'idle' });
  });

  it('back from the causes after the first result opens that check again', async () => {
    const h = harness();
    const actor = await quickAtRanking(h);
    // Nothing recorded yet: Back from the causes goes nowhere.
    actor.send({ type: 'CHECK.BACK' });
    expect(actor.getSnapshot().value).toEqual({ ranking: 'idle' });
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine');
    actor.send({ type: 'CHECK.BACK' });
    expect(actor.getSnapshot().value).toEqual({ check: 'steps' });
    expect(current(actor)).toBe('check-a');
  });

  it('skip: moves the check to the end of the plan for now and keeps the skipped ids', async () => {
    const h = harness();
    const actor = await quickAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    expect(current(actor)).toBe('check-a');
    actor.send({ type: 'CHECK.SKIP' });
    expect(current(actor)).toBe('check-b');
    expect(actor.getSnapshot().context.skipped).toEqual(['check-a']);
    await record(actor, 'looks-fine');
    // Skipped checks stay at the end after the plan is re-ranked.
    actor.send({ type: 'CHECKS.START' });
    expect(current(actor)).toBe('check-c');
    actor.send({ type: 'CHECK.SKIP' });
    expect(actor.getSnapshot().context.skipped).toEqual(['check-a', 'check-c']);
    expect(current(actor)).toBe('check-stop');
    actor.send({ type: 'CHECK.SKIP' });
    // Everything skipped once: the first skipped comes round again, cautions first.
    expect(current(actor)).toBe('check-a');
    expect(actor.getSnapshot().value).toEqual({ check: 'cautions' });
    await record(actor, 'looks-fine');
    expect(actor.getSnapshot().context.skipped).toEqual(['check-c', 'check-stop']);
  });

  it('could not check: sent as not-checked and taken off the plan', async () => {
    const h = harness();
    const actor = await quickAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'not-checked', 'no tools with me');
    const snap = actor.getSnapshot();
    expect(h.rankRequests.at(-1)?.results).toEqual({ 'check-a': 'not-checked' });
    expect(snap.context.results[0]).toEqual({ checkId: 'check-a', result: 'not-checked', note: 'no tools with me' });
    expect(snap.context.rank?.plan.some((s) => s.checkId === 'check-a')).toBe(false);
    // Not a "looks fine": the fake ranking leaves cause-x where it was.
    expect(snap.context.rank?.causes[0].probability).toBe(0.5);
  });

  it('stop: a stop finding ends the walk-through before anything else', async () => {
    const h = harness();
    const actor = await quickAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'CHECK.SKIP' });
    actor.send({ type: 'CHECK.SKIP' });
    actor.send({ type: 'CHECK.SKIP' });
    expect(current(actor)).toBe('check-stop');
    expect(actor.getSnapshot().value).toEqual({ check: 'cautions' });
    await record(actor, 'fault-found');
    const snap = actor.getSnapshot();
    expect(snap.value).toBe('stopped');
    expect(snap.context.stop?.checkId).toBe('check-stop');
    // No way on to the checks or a fix from here.
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'RESOLVE.START' });
    expect(actor.getSnapshot().value).toBe('stopped');
    actor.send({ type: 'STOP.ACKNOWLEDGE' });
    expect(actor.getSnapshot().value).toBe('summary');
    expect(actor.getSnapshot().context.stop).not.toBeNull();
  });

  it('finish without a fix: from the causes straight to the summary', async () => {
    const actor = await quickAtRanking(harness());
    actor.send({ type: 'FINISH' });
    expect(actor.getSnapshot().value).toBe('summary');
    expect(actor.getSnapshot().context.resolution).toBeNull();
  });

  it('resume: a persisted snapshot restores the place, mid-check, and goes on from there', async () => {
    const h = harness();
    const actor = await quickAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'CAUTIONS.ACKNOWLEDGE' });
    actor.send({ type: 'CHECK.SKIP' });
    actor.send({ type: 'CHECK.BACK' }); // nothing recorded yet: back to the causes
    actor.send({ type: 'CHECKS.START' });
    expect(current(actor)).toBe('check-b');
    const stored = JSON.stringify(actor.getPersistedSnapshot());
    actor.stop();

    const restored = restore(h, stored);
    restored.start();
    const snap = restored.getSnapshot();
    expect(snap.value).toEqual({ check: 'steps' });
    expect(snap.context.currentCheckId).toBe('check-b');
    expect(snap.context.skipped).toEqual(['check-a']);
    expect(snap.context.acknowledged).toEqual(['check-a']);
    expect(snap.context.symptoms).toEqual([BOG, { id: 'symptom-2' }]);

    await record(restored, 'looks-fine');
    expect(restored.getSnapshot().context.results).toEqual([{ checkId: 'check-b', result: 'looks-fine', note: '' }]);
    restored.send({ type: 'CHECKS.START' });
    expect(current(restored)).toBe('check-c');
  });

  it('a 400 from the ranking returns to the intake with the messages per field, nothing lost', async () => {
    const h = harness();
    const actor = start(h);
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [{ id: 'no-such-symptom' }] });
    actor.send({ type: 'INTAKE.CARBURETTOR', carburettorKind: 'pump-around' });
    h.failNext.rank = new ApiError(400, 'Invalid rank request: symptoms.0', { 'symptoms.0': ['unknown symptom "no-such-symptom"'] });
    actor.send({ type: 'INTAKE.SUBMIT' });
    await atRest(actor);
    const snap = actor.getSnapshot();
    expect(snap.value).toEqual({ intake: 'editing' });
    expect(snap.context.error).toEqual({
      status: 400,
      message: 'Invalid rank request: symptoms.0',
      fields: { 'symptoms.0': ['unknown symptom "no-such-symptom"'] },
    });
    expect(snap.context.symptoms).toEqual([{ id: 'no-such-symptom' }]);
    // The error is kept as plain data, so the snapshot still persists as JSON.
    expect(JSON.parse(JSON.stringify(actor.getPersistedSnapshot()))).toMatchObject({ context: { error: { status: 400 } } });
  });

  it('a failed re-ranking keeps the check open and the result unrecorded', async () => {
    const h = harness();
    const actor = await quickAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'CAUTIONS.ACKNOWLEDGE' });
    h.failNext.rank = new ApiError(0, 'Cannot reach Fuelwright.');
    actor.send({ type: 'CHECK.RECORD', result: 'looks-fine' });
    await atRest(actor);
    let snap = actor.getSnapshot();
    expect(snap.value).toEqual({ check: 'steps' });
    expect(snap.context.error?.message).toBe('Cannot reach Fuelwright.');
    expect(snap.context.results).toEqual([]);
    expect(snap.context.pending).toBeNull();
    // Trying again works.
    actor.send({ type: 'CHECK.RECORD', result: 'looks-fine' });
    await atRest(actor);
    snap = actor.getSnapshot();
    expect(snap.value).toEqual({ ranking: 'idle' });
    expect(snap.context.error).toBeNull();
    expect(snap.context.results).toHaveLength(1);
  });
});

/** A new case on kart-1, opened from the intake, at the causes and plan. */
async function caseAtRanking(h: Harness): Promise<Actor> {
  const actor = start(h, { mode: 'case', kartId: null });
  actor.send({ type: 'INTAKE.KART', kartId: 'kart-1', carburettorKind: 'pump-around', displacementCc: 125 });
  await atRest(actor);
  actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG] });
  actor.send({ type: 'INTAKE.SUBMIT' });
  await atRest(actor);
  expect(actor.getSnapshot().value).toEqual({ ranking: 'idle' });
  return actor;
}

describe('walk-through machine, case mode', () => {

  it('intake: the kart is required, and its latest setup fills the setup (editable)', async () => {
    const h = harness();
    const actor = start(h, { mode: 'case' });
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG] });
    actor.send({ type: 'INTAKE.SUBMIT' });
    expect(actor.getSnapshot().context.formErrors.kartId).toBeDefined();
    // The carburettor kind comes from the kart: a visitor's choice is not taken in case mode.
    expect(actor.getSnapshot().context.formErrors.carburettorKind).toBeUndefined();

    actor.send({ type: 'INTAKE.KART', kartId: 'kart-1', carburettorKind: 'pump-around', displacementCc: 125 });
    await atRest(actor);
    let ctx = actor.getSnapshot().context;
    expect(ctx.setupDraft).toEqual({ mainJet: '182.5', needleClipGroove: '3', ventLinesFitted: 'yes' });
    expect(ctx.setupFrom).toBe('2026-11-21');
    expect(ctx.formErrors.kartId).toBeUndefined();

    // Untouched, the setup is left to the server (it takes the kart's latest snapshot).
    actor.send({ type: 'INTAKE.SUBMIT' });
    await atRest(actor);
    expect(h.server.calls[0]).toEqual({ name: 'openCase', input: { kartId: 'kart-1', symptoms: [BOG] } });
    ctx = actor.getSnapshot().context;
    expect(ctx.caseId).toBe('case-1');
    expect(ctx.caseState).toBe('open');
  });

  it('an edited setup is sent with the new case; a kart without setups starts empty', async () => {
    const h = harness();
    const actor = start(h, { mode: 'case' });
    actor.send({ type: 'INTAKE.KART', kartId: 'kart-2', carburettorKind: 'float-valve', displacementCc: 100 });
    await atRest(actor);
    expect(actor.getSnapshot().context.setupDraft).toEqual({});
    actor.send({ type: 'INTAKE.KART', kartId: 'kart-1', carburettorKind: 'pump-around', displacementCc: 125 });
    await atRest(actor);
    actor.send({ type: 'INTAKE.SETUP', field: 'mainJet', value: '185' });
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG] });
    actor.send({ type: 'INTAKE.SUBMIT' });
    await atRest(actor);
    expect(h.server.calls[0].input).toEqual({
      kartId: 'kart-1',
      symptoms: [BOG],
      setup: { mainJet: 185, needleClipGroove: 3, ventLinesFitted: true },
    });
  });

  it('happy path on the server: record, re-rank from the case, resolve', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine', 'fine');
    let snap = actor.getSnapshot();
    expect(h.server.calls.at(-1)).toEqual({ name: 'recordResult', input: { caseId: 'case-1', checkId: 'check-a', result: 'looks-fine', note: 'fine' } });
    expect(snap.value).toEqual({ ranking: 'idle' });
    expect(snap.context.results).toEqual([{ checkId: 'check-a', result: 'looks-fine', note: 'fine' }]);
    expect(snap.context.previousCauses?.[0].probability).toBe(0.5);
    expect(snap.context.rank?.causes[0].probability).toBe(0.25);

    actor.send({ type: 'RESOLVE.START' });
    actor.send({ type: 'RESOLVE.SUBMIT', causeId: 'something-else', fix: 'New plug lead' });
    await atRest(actor);
    snap = actor.getSnapshot();
    expect(snap.value).toBe('summary');
    expect(snap.context.caseState).toBe('resolved');
    expect(snap.context.resolution).toEqual({ causeId: 'something-else', fix: 'New plug lead', note: '' });
  });

  it('back and re-record on a case: the server keeps the latest result of the check', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine');
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'CHECK.BACK' });
    expect(current(actor)).toBe('check-a');
    await record(actor, 'fault-found');
    const ctx = actor.getSnapshot().context;
    expect(ctx.results).toEqual([{ checkId: 'check-a', result: 'fault-found', note: '' }]);
    expect(h.server.cases.get('case-1')?.results).toHaveLength(1);
  });

  it('stop on a case: the server stops the case, the machine shows the stop', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'CHECK.SKIP' });
    actor.send({ type: 'CHECK.SKIP' });
    actor.send({ type: 'CHECK.SKIP' });
    expect(current(actor)).toBe('check-stop');
    await record(actor, 'fault-found');
    expect(actor.getSnapshot().value).toBe('stopped');
    expect(actor.getSnapshot().context.caseState).toBe('stopped');
    expect(actor.getSnapshot().context.stop?.reason).toMatch(/Do not drive/);
  });

  it('changing the symptoms of an open case goes through the server and keeps the results', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine');
    actor.send({ type: 'INTAKE.EDIT' });
    expect(actor.getSnapshot().value).toEqual({ intake: 'editing' });
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG, { id: 'symptom-2' }] });
    const before = actor.getSnapshot().context.rank!.causes.map((c) => ({ id: c.id, probability: c.probability }));
    // The new symptom moves cause-x (plumbing for the test, not a trade fact).
    const report = h.server.symptoms.bind(h.server);
    h.server.symptoms = (input) => {
      const dto = report(input);
      dto.rank = { ...dto.rank, causes: dto.rank.causes.map((c) => (c.id === 'cause-x' ? { ...c, probability: 0.6 } : c)) };
      return dto;
    };
    actor.send({ type: 'INTAKE.SUBMIT' });
    await atRest(actor);
    expect(h.server.calls.at(-1)).toEqual({ name: 'reportSymptoms', input: { caseId: 'case-1', symptoms: [BOG, { id: 'symptom-2' }] } });
    const snap = actor.getSnapshot();
    expect(snap.value).toEqual({ ranking: 'idle' });
    expect(snap.context.symptoms).toHaveLength(2);
    expect(snap.context.results).toHaveLength(1);
    // "What changed" compares with the ranking before the new symptoms, not with the new one.
    expect(snap.context.previousCauses).toEqual(before);
    expect(snap.context.rank!.causes.map((c) => c.probability)).not.toEqual(before.map((c) => c.probability));
  });

  it('abandon: the case is closed on the server and the summary shows', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'ABANDON', reason: ' sold the kart ' });
    await atRest(actor);
    expect(h.server.calls.at(-1)).toEqual({ name: 'abandonCase', input: { caseId: 'case-1', reason: 'sold the kart' } });
    expect(actor.getSnapshot().value).toBe('summary');
    expect(actor.getSnapshot().context.caseState).toBe('abandoned');
  });

  it('loading a saved case goes to its causes; a finished one to its summary', async () => {
    const h = harness();
    const opened = h.server.open({ kartId: 'kart-1', symptoms: ['symptom-1'] });
    const actor = start(h, { mode: 'case', caseId: opened.id });
    await atRest(actor);
    expect(actor.getSnapshot().value).toEqual({ ranking: 'idle' });
    expect(actor.getSnapshot().context.symptoms).toEqual([{ id: 'symptom-1' }]);
    expect(actor.getSnapshot().context.carburettorKind).toBe('pump-around');

    h.server.resolve({ caseId: opened.id, causeId: 'cause-x', fix: 'x' });
    const again = start(h, { mode: 'case', caseId: opened.id });
    await atRest(again);
    expect(again.getSnapshot().value).toBe('summary');
  });

  it('resume a case: restores the place mid-check and reconciles with the server', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'CAUTIONS.ACKNOWLEDGE' });
    const stored = JSON.stringify(actor.getPersistedSnapshot());
    actor.stop();

    // Nothing changed on the server: back on check-a's steps.
    const restored = restore(h, stored);
    restored.start();
    expect(restored.getSnapshot().value).toEqual({ check: 'steps' });
    restored.send({ type: 'RECONCILE' });
    expect(restored.getSnapshot().hasTag('busy')).toBe(true);
    await atRest(restored);
    expect(restored.getSnapshot().value).toEqual({ check: 'steps' });
    expect(current(restored)).toBe('check-a');
    restored.stop();

    // Meanwhile check-a was recorded elsewhere (another phone): the server's case wins.
    h.server.record({ caseId: 'case-1', checkId: 'check-a', result: 'fault-found' });
    const second = restore(h, stored);
    second.start();
    second.send({ type: 'RECONCILE' });
    await atRest(second);
    expect(second.getSnapshot().value).toEqual({ ranking: 'idle' });
    expect(second.getSnapshot().context.results).toEqual([{ checkId: 'check-a', result: 'fault-found', note: '' }]);
    second.stop();

    // And once the case is resolved elsewhere, the saved place gives way to the summary.
    h.server.resolve({ caseId: 'case-1', causeId: 'cause-x', fix: 'x' });
    const third = restore(h, stored);
    third.start();
    third.send({ type: 'RECONCILE' });
    await atRest(third);
    expect(third.getSnapshot().value).toBe('summary');
    expect(third.getSnapshot().context.caseState).toBe('resolved');
  });

  it('a 409 (case finished elsewhere) reloads the case and says so', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    actor.send({ type: 'CAUTIONS.ACKNOWLEDGE' });
    h.server.abandon({ caseId: 'case-1' });
    actor.send({ type: 'CHECK.RECORD', result: 'looks-fine' });
    await atRest(actor);
    const snap = actor.getSnapshot();
    expect(h.server.calls.map((c) => c.name).slice(-2)).toEqual(['recordResult', 'loadCase']);
    expect(snap.value).toBe('summary');
    expect(snap.context.caseState).toBe('abandoned');
    expect(snap.context.notice).toMatch(/changed elsewhere/);
    expect(snap.context.results).toEqual([]);
  });

  it('a 400 on resolving keeps the form with the field messages', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'RESOLVE.START' });
    h.failNext.resolveCase = new ApiError(400, 'Invalid', { causeId: ['unknown cause "x"'] });
    actor.send({ type: 'RESOLVE.SUBMIT', causeId: 'x', fix: 'y' });
    await atRest(actor);
    expect(actor.getSnapshot().value).toEqual({ resolve: 'editing' });
    expect(actor.getSnapshot().context.error?.fields).toEqual({ causeId: ['unknown cause "x"'] });
    expect(actor.getSnapshot().context.caseState).toBe('open');
  });

  it('a case that cannot be loaded shows the failure and can be tried again', async () => {
    const h = harness();
    const opened = h.server.open({ kartId: 'kart-1', symptoms: ['symptom-1'] });
    h.failNext.loadCase = new ApiError(503, 'Something went wrong on our side.');
    const actor = start(h, { mode: 'case', caseId: opened.id });
    await atRest(actor);
    expect(actor.getSnapshot().value).toBe('failed');
    expect(actor.getSnapshot().context.error?.status).toBe(503);
    actor.send({ type: 'RETRY' });
    await atRest(actor);
    expect(actor.getSnapshot().value).toEqual({ ranking: 'idle' });
    expect(actor.getSnapshot().context.error).toBeNull();
  });
});

describe("walk-through machine, the day's air and fuel", () => {
  /** A draft with today's air and a reference day typed in hPa and °C (the figures are plumbing, not trade facts). */
  function draft(patch: Partial<ConditionsDraft> = {}): ConditionsDraft {
    const empty = emptyConditionsDraft();
    return {
      ...empty,
      units: { temperature: 'C', pressure: 'hPa', length: 'm' },
      today: { ...empty.today, temperature: '5', humidity: '50', stationPressure: '1000' },
      reference: { ...empty.reference, temperature: '30', humidity: '50', stationPressure: '1000' },
      fuelAgeDays: '40',
      ...patch,
    };
  }

  it('quick mode: the air and fuel age go into every rank request, the change worked out from both days', async () => {
    const h = harness();
    const actor = start(h);
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG] });
    actor.send({ type: 'INTAKE.CARBURETTOR', carburettorKind: 'pump-around' });
    actor.send({ type: 'INTAKE.CONDITIONS', draft: draft() });
    actor.send({ type: 'INTAKE.SUBMIT' });
    await atRest(actor);
    expect(actor.getSnapshot().value).toEqual({ ranking: 'idle' });
    const conditions = h.rankRequests[0].conditions!;
    expect(conditions.today).toEqual({ temperatureC: 5, relativeHumidityPct: 50, stationPressureHpa: 1000, densityKgM3: expect.any(Number) });
    expect(conditions.reference).toEqual({ temperatureC: 30, relativeHumidityPct: 50, stationPressureHpa: 1000, densityKgM3: expect.any(Number) });
    expect(conditions.fuelAgeDays).toBe(40);
    // The change sent is the one of the two densities sent (no second sum on the server).
    expect(conditions.densityChangePct).toBeCloseTo(densityChangePct(conditions.reference!.densityKgM3!, conditions.today!.densityKgM3!), 10);
    // Same pressure and humidity, 25 °C colder: denser air (ideal gas law, density ∝ p/T; from memory).
    expect(conditions.densityChangePct).toBeGreaterThan(0);

    // Re-ranking after a check keeps them.
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine');
    expect(h.rankRequests[1].conditions).toEqual(conditions);
  });

  it('an impossible humidity is named and blocks the ranking; what was typed stays, and fixing it clears the message', async () => {
    const h = harness();
    const actor = start(h);
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG] });
    actor.send({ type: 'INTAKE.CARBURETTOR', carburettorKind: 'pump-around' });
    const bad = draft({ today: { ...draft().today, humidity: '140' }, fuelAgeDays: '-2' });
    actor.send({ type: 'INTAKE.CONDITIONS', draft: bad });
    actor.send({ type: 'INTAKE.SUBMIT' });
    const { formErrors, conditionsDraft } = actor.getSnapshot().context;
    // Relative humidity is a fraction of saturation, 0 to 100 % (WMO-No. 8, Guide to Instruments and Methods of Observation).
    expect(formErrors['conditions.today.relativeHumidityPct']).toBe('Relative humidity today: between 0 and 100 %.');
    expect(formErrors['conditions.fuelAgeDays']).toMatch(/^Days since the fuel was mixed: /);
    expect(actor.getSnapshot().value).toEqual({ intake: 'editing' });
    expect(h.rankRequests).toHaveLength(0);
    expect(conditionsDraft).toEqual(bad);

    actor.send({ type: 'INTAKE.CONDITIONS', draft: { ...bad, today: { ...bad.today, humidity: '70' } } });
    expect(actor.getSnapshot().context.formErrors['conditions.today.relativeHumidityPct']).toBeUndefined();
    expect(actor.getSnapshot().context.formErrors['conditions.fuelAgeDays']).toBeDefined();
    actor.send({ type: 'INTAKE.CONDITIONS', draft: { ...bad, today: { ...bad.today, humidity: '70' }, fuelAgeDays: '2' } });
    actor.send({ type: 'INTAKE.SUBMIT' });
    await atRest(actor);
    expect(h.rankRequests[0].conditions?.today?.relativeHumidityPct).toBe(70);
    expect(h.rankRequests[0].conditions?.fuelAgeDays).toBe(2);
  });

  it('case mode: the new case is opened with the air, the reference day taken from the jetting log', async () => {
    const h = harness();
    const actor = start(h, { mode: 'case' });
    actor.send({ type: 'INTAKE.KART', kartId: 'kart-1', carburettorKind: 'pump-around', displacementCc: 125 });
    await atRest(actor);
    const session: ReferenceSession = { sessionId: 's-1', sessionOn: '2026-10-04', temperatureC: 25, stationPressureHpa: 990, relativeHumidityPct: 60, densityKgM3: 1.15 };
    actor.send({ type: 'INTAKE.CONDITIONS', draft: draft({ referenceFrom: 'log', referenceSession: session, fuelAgeDays: '' }) });
    actor.send({ type: 'INTAKE.SYMPTOMS', symptoms: [BOG] });
    actor.send({ type: 'INTAKE.SUBMIT' });
    await atRest(actor);
    const sent = h.server.calls[0].input as OpenCaseRequest;
    expect(sent.conditions?.reference).toEqual({ temperatureC: 25, stationPressureHpa: 990, relativeHumidityPct: 60, densityKgM3: 1.15 });
    expect(sent.conditions?.today?.temperatureC).toBe(5);
    expect(sent.conditions?.densityChangePct).toBeCloseTo(densityChangePct(1.15, sent.conditions!.today!.densityKgM3!), 10);
    expect(sent.conditions).not.toHaveProperty('fuelAgeDays');
  });

  it('nothing typed: no conditions in the request', async () => {
    const h = harness();
    await quickAtRanking(h);
    expect(h.rankRequests[0]).not.toHaveProperty('conditions');
  });
});

describe("walk-through machine, correcting an open case's setup and the day's air", () => {
  /** The figures are plumbing (what is sent and kept), not trade facts. */
  const TODAY = { temperatureC: 12, relativeHumidityPct: 40, stationPressureHpa: 990 };

  it('prefills from the case, sends the setup and only changed conditions, and takes the new ranking with the results kept', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'CHECKS.START' });
    await record(actor, 'looks-fine');
    h.server.cases.get('case-1')!.conditions = { today: TODAY, fuelAgeDays: 3 };
    actor.send({ type: 'RECONCILE' });
    await atRest(actor);

    actor.send({ type: 'FACTS.EDIT' });
    let snap = actor.getSnapshot();
    expect(snap.value).toEqual({ correcting: 'editing' });
    expect(snap.context.correction?.setupDraft).toEqual({ mainJet: '180' });
    expect(snap.context.correction?.conditionsDraft.today).toMatchObject({ temperature: '12', humidity: '40', stationPressure: '990' });
    expect(snap.context.correction?.conditionsDraft.fuelAgeDays).toBe('3');

    // Only the main jet: the day's air is not sent, so it stays exactly as recorded.
    actor.send({ type: 'FACTS.SETUP', field: 'mainJet', value: '205' });
    actor.send({ type: 'FACTS.SUBMIT' });
    await atRest(actor);
    expect(h.server.calls.at(-1)).toEqual({
      name: 'correctFacts',
      input: { caseId: 'case-1', setup: { mainJet: 205, carburettorKind: 'pump-around' } },
    });
    snap = actor.getSnapshot();
    expect(snap.value).toEqual({ ranking: 'idle' });
    expect(snap.context.rank?.causes.find((c) => c.id === 'cause-y')?.probability).toBe(0.6);
    expect(snap.context.previousCauses?.find((c) => c.id === 'cause-y')?.probability).toBe(0.3);
    expect(snap.context.setupDraft.mainJet).toBe('205');
    expect(snap.context.results).toHaveLength(1);
    expect(snap.context.correction).toBeNull();
    expect(snap.context.factsCorrected).toBe(true);

    // Then the fuel age: the conditions go, today's air as the case had it.
    actor.send({ type: 'FACTS.EDIT' });
    const conditionsDraft = actor.getSnapshot().context.correction!.conditionsDraft;
    actor.send({ type: 'FACTS.CONDITIONS', draft: { ...conditionsDraft, fuelAgeDays: '30' } });
    actor.send({ type: 'FACTS.SUBMIT' });
    await atRest(actor);
    const sent = h.server.calls.at(-1)?.input as CorrectCaseFactsRequest;
    expect(sent.conditions).toEqual({ today: expect.objectContaining(TODAY), fuelAgeDays: 30 });
    expect(actor.getSnapshot().context.caseConditions.fuelAgeDays).toBe(30);
  });

  it('a value out of range is named before sending; a 400 keeps what was typed and shows the message under its field', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'FACTS.EDIT' });
    actor.send({ type: 'FACTS.SETUP', field: 'mainJet', value: '5' });
    actor.send({ type: 'FACTS.SUBMIT' });
    expect(actor.getSnapshot().value).toEqual({ correcting: 'editing' });
    expect(actor.getSnapshot().context.formErrors['setup.mainJet']).toMatch(/^Main jet: between/);
    expect(h.server.calls.some((c) => c.name === 'correctFacts')).toBe(false);

    actor.send({ type: 'FACTS.SETUP', field: 'mainJet', value: '190' });
    expect(actor.getSnapshot().context.formErrors).toEqual({});
    h.failNext.correctFacts = new ApiError(400, 'Invalid', { 'setup.mainJet': ['mainJet must be a jet size the ruleset knows'] });
    actor.send({ type: 'FACTS.SUBMIT' });
    await atRest(actor);
    const snap = actor.getSnapshot();
    expect(snap.value).toEqual({ correcting: 'editing' });
    expect(snap.context.error?.fields).toEqual({ 'setup.mainJet': ['mainJet must be a jet size the ruleset knows'] });
    expect(snap.context.correction?.setupDraft.mainJet).toBe('190');
    expect(snap.context.setupDraft.mainJet).toBe('180');
  });

  it('a correction being typed survives a reload; cancel leaves the case as it was', async () => {
    const h = harness();
    const actor = await caseAtRanking(h);
    actor.send({ type: 'FACTS.EDIT' });
    actor.send({ type: 'FACTS.SETUP', field: 'pilotJet', value: '40' });
    const stored = JSON.stringify(actor.getPersistedSnapshot());
    actor.stop();

    const again = restore(h, stored);
    again.start();
    again.send({ type: 'RECONCILE' });
    await atRest(again);
    expect(again.getSnapshot().value).toEqual({ correcting: 'editing' });
    expect(again.getSnapshot().context.correction?.setupDraft.pilotJet).toBe('40');

    again.send({ type: 'FACTS.CANCEL' });
    expect(again.getSnapshot().value).toEqual({ ranking: 'idle' });
    expect(again.getSnapshot().context.correction).toBeNull();
    expect(h.server.calls.some((c) => c.name === 'correctFacts')).toBe(false);
  });

  it('not offered in quick mode, nor on a finished case; a 409 reloads the case', async () => {
    const h = harness();
    const quick = await quickAtRanking(h);
    quick.send({ type: 'FACTS.EDIT' });
    expect(quick.getSnapshot().value).toEqual({ ranking: 'idle' });

    const actor = await caseAtRanking(h);
    actor.send({ type: 'FACTS.EDIT' });
    h.server.abandon({ caseId: 'case-1' });
    actor.send({ type: 'FACTS.SUBMIT' });
    await atRest(actor);
    expect(actor.getSnapshot().value).toBe('summary');
    expect(actor.getSnapshot().context.notice).toMatch(/changed elsewhere/);
  });
});
