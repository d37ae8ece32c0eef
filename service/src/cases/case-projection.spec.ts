import { describe, expect, it } from 'vitest';
import { CASE_EVENT_TYPES, type CaseEventType, type RankResponse } from '@fuelwright/shared';
import { applyEvent, canApply, CaseEventError, replay, resultsMap, type CaseEvent, type CaseProjection } from './case-projection.js';

/** A ranking small enough to tell apart by its top cause (the projection stores it as given). */
function rank(top: string, probability = 0.5): RankResponse {
  return {
    version: '1.0.0',
    causes: [{ id: top, label: top, probability, prior: 0.1, logOdds: 0, reasons: [], fixes: [] }],
    somethingElse: { label: 'Something else', probability: 1 - probability },
    excluded: [],
    plan: [],
    expectedMinutes: 0,
    cautions: [],
  };
}

const KART = '11111111-1111-4111-8111-111111111111';
const RACER = '22222222-2222-4222-8222-222222222222';
const COACH = '33333333-3333-4333-8333-333333333333';
const t = (minute: number) => new Date(Date.UTC(2026, 10, 20, 9, minute));

const opened: CaseEvent = {
  type: 'opened',
  at: t(0),
  actorId: RACER,
  payload: {
    kartId: KART,
    symptoms: [{ id: 'bog-on-acceleration', band: 'up-to-quarter' }],
    setup: { carburettorKind: 'pump-around', mainJet: 120 },
    conditions: { fuelAgeDays: 3 },
    rulesetVersion: '1.0.0',
    rank: rank('foam-degraded'),
  },
};

const stopEvent: CaseEvent = {
  type: 'stopped',
  at: t(9),
  actorId: RACER,
  payload: { stop: { reason: 'The throttle does not snap back to closed by itself.', checkId: 'throttle-return', ruleId: 'stop-throttle-does-not-return' } },
};

/** One event of each type an open case takes, for the refusal table. */
const step: Record<Exclude<CaseEventType, 'opened'>, CaseEvent> = {
  'symptoms-reported': { type: 'symptoms-reported', at: t(5), actorId: RACER, payload: { symptoms: [{ id: 'hesitation' }], rank: rank('pilot-jet-blocked') } },
  'check-recorded': { type: 'check-recorded', at: t(6), actorId: RACER, payload: { checkId: 'foam-inspect', result: 'looks-fine', note: '', rank: rank('pump-diaphragm') } },
  stopped: stopEvent,
  resolved: { type: 'resolved', at: t(10), actorId: RACER, payload: { causeId: 'foam-degraded', fix: 'New foam', note: '' } },
  abandoned: { type: 'abandoned', at: t(10), actorId: RACER, payload: { reason: 'Sold the kart' } },
  'check-recommended': { type: 'check-recommended', at: t(7), actorId: COACH, payload: { checkId: 'fuel-filter-look', reason: 'Look here first' } },
  'facts-corrected': { type: 'facts-corrected', at: t(8), actorId: RACER, payload: { setup: { carburettorKind: 'pump-around', mainJet: 125 }, conditions: {}, rank: rank('main-jet-small') } },
};

describe('case projection: replay', () => {
  it('replays a sequence of events into the state they describe', () => {
    const events: CaseEvent[] = [
      opened,
      { type: 'check-recorded', at: t(2), actorId: RACER, payload: { checkId: 'foam-inspect', result: 'looks-fine', note: 'clean', rank: rank('pump-diaphragm', 0.4) } },
      { type: 'check-recommended', at: t(3), actorId: COACH, payload: { checkId: 'fuel-filter-look', reason: 'Look here first' } },
      { type: 'symptoms-reported', at: t(4), actorId: RACER, payload: { symptoms: [{ id: 'bog-on-acceleration' }, { id: 'sporadic-running' }], rank: rank('fuel-filter-blocked', 0.45) } },
      { type: 'check-recorded', at: t(5), actorId: RACER, payload: { checkId: 'fuel-filter-look', result: 'fault-found', note: 'dark', rank: rank('fuel-filter-blocked', 0.9) } },
      { type: 'resolved', at: t(6), actorId: RACER, payload: { causeId: 'fuel-filter-blocked', fix: 'New filter', note: 'runs clean' } },
    ];
    const p = replay(events);
    expect(p).toEqual<CaseProjection>({
      state: 'resolved',
      kartId: KART,
      rulesetVersion: '1.0.0',
      symptoms: [{ id: 'bog-on-acceleration' }, { id: 'sporadic-running' }],
      setup: { carburettorKind: 'pump-around', mainJet: 120 },
      conditions: { fuelAgeDays: 3 },
      results: [
        { checkId: 'foam-inspect', result: 'looks-fine', note: 'clean', at: t(2).toISOString(), by: RACER },
        { checkId: 'fuel-filter-look', result: 'fault-found', note: 'dark', at: t(5).toISOString(), by: RACER },
      ],
      rank: rank('fuel-filter-blocked', 0.9),
      openingRank: rank('foam-degraded'),
      resolution: { causeId: 'fuel-filter-blocked', fix: 'New filter', note: 'runs clean', at: t(6).toISOString(), by: RACER },
      stop: null,
      abandonedReason: null,
      recommendations: [{ checkId: 'fuel-filter-look', reason: 'Look here first', by: COACH, at: t(3).toISOString() }],
    });
    // Replaying a prefix gives the case as it stood at that step.
    expect(replay(events.slice(0, 2))).toMatchObject({ state: 'open', rank: rank('pump-diaphragm', 0.4), results: [{ checkId: 'foam-inspect' }] });
    // Pure: replaying again gives the same state, and the events were not changed.
    expect(replay(events)).toEqual(p);
  });

  it('a re-recorded result replaces the old one; the ranking is the latest step’s', () => {
    const p = replay([
      opened,
      { type: 'check-recorded', at: t(2), actorId: RACER, payload: { checkId: 'foam-inspect', result: 'fault-found', note: 'torn', rank: rank('foam-degraded', 0.8) } },
      { type: 'check-recorded', at: t(3), actorId: RACER, payload: { checkId: 'throttle-return', result: 'looks-fine', note: '', rank: rank('foam-degraded', 0.85) } },
      { type: 'check-recorded', at: t(4), actorId: RACER, payload: { checkId: 'foam-inspect', result: 'not-checked', note: 'no time', rank: rank('pump-diaphragm', 0.3) } },
    ]);
    expect(p.results).toEqual([
      { checkId: 'throttle-return', result: 'looks-fine', note: '', at: t(3).toISOString(), by: RACER },
      { checkId: 'foam-inspect', result: 'not-checked', note: 'no time', at: t(4).toISOString(), by: RACER },
    ]);
    expect(resultsMap(p)).toEqual({ 'throttle-return': 'looks-fine', 'foam-inspect': 'not-checked' });
    expect(p.rank).toEqual(rank('pump-diaphragm', 0.3));
    expect(p.openingRank).toEqual(rank('foam-degraded'));
  });

  it('a stop keeps the case’s results and takes only resolve or abandon afterwards', () => {
    const p = replay([opened, step['check-recorded'], stopEvent]);
    expect(p.state).toBe('stopped');
    expect(p.stop).toEqual(stopEvent.payload.stop);
    expect(p.results).toHaveLength(1);
    expect(replay([opened, stopEvent, step.resolved]).state).toBe('resolved');
    expect(replay([opened, stopEvent, step.abandoned])).toMatchObject({ state: 'abandoned', abandonedReason: 'Sold the kart' });
  });

  it('facts-corrected changes setup, conditions and ranking, never the opening ranking', () => {
    const p = replay([opened, step['facts-corrected']]);
    expect(p.setup).toEqual({ carburettorKind: 'pump-around', mainJet: 125 });
    expect(p.conditions).toEqual({});
    expect(p.rank).toEqual(rank('main-jet-small'));
    expect(p.openingRank).toEqual(rank('foam-degraded'));
  });
});

describe('case projection: what each state accepts', () => {
  const steps = CASE_EVENT_TYPES.filter((x): x is Exclude<CaseEventType, 'opened'> => x !== 'opened');

  it('an open case takes every step; a resolved or abandoned one takes none; a stopped one only resolve and abandon', () => {
    for (const type of steps) {
      expect(canApply('open', type), `open: ${type}`).toBe(true);
      expect(canApply('resolved', type), `resolved: ${type}`).toBe(false);
      expect(canApply('abandoned', type), `abandoned: ${type}`).toBe(false);
      expect(canApply('stopped', type), `stopped: ${type}`).toBe(type === 'resolved' || type === 'abandoned');
    }
    for (const state of ['open', 'stopped', 'resolved', 'abandoned'] as const) expect(canApply(state, 'opened')).toBe(false);
  });

  it('applyEvent refuses with CaseEventError what the state does not take, and leaves the state as it was', () => {
    const ends: Record<string, CaseProjection> = {
      resolved: replay([opened, step.resolved]),
      abandoned: replay([opened, step.abandoned]),
      stopped: replay([opened, stopEvent]),
    };
    for (const [state, p] of Object.entries(ends)) {
      const before = structuredClone(p);
      for (const type of steps) {
        if (canApply(p.state, type)) continue;
        expect(() => applyEvent(p, step[type]), `${state}: ${type}`).toThrow(CaseEventError);
      }
      expect(p).toEqual(before);
    }
    expect(() => applyEvent(ends.stopped, step['check-recorded'])).toThrow(/a stopped case does not take "check-recorded"/);
  });

  it('applyEvent throws CaseEventError on an event before "opened" and on a second "opened"', () => {
    expect(() => applyEvent(null, step['check-recorded'])).toThrow(CaseEventError);
    expect(() => applyEvent(null, step['check-recorded'])).toThrow(/before the case was opened/);
    expect(() => applyEvent(replay([opened]), opened)).toThrow(/opened only once/);
    expect(() => replay([])).toThrow(CaseEventError);
  });
});
