/**
 * The walk-through's pure pieces: reading the setup draft (ranges from shared/setup.ts), the plan
 * order with skipped checks, Back's previous check, re-recording. Plumbing, not trade facts: the
 * ids are neutral and the ranges are the contract's own.
 */
import { describe, expect, it } from 'vitest';
import type { PlanStep, RankResponse } from '@fuelwright/shared';
import { draftFromSetup, orderedPlan, parseSetupDraft, previousCheckId, symptomsForRequest, toWalkThroughError, withResult } from './walk-through-model';
import { ApiError } from '../../../lib/api-client';

const step = (checkId: string): PlanStep => ({
  checkId,
  label: checkId,
  group: 'outside',
  minutes: 1,
  openingMinutes: 0,
  cautions: [],
  findProbability: 0.1,
  causes: [],
  safetyFirst: false,
});
const rank = (ids: string[]) => ({ plan: ids.map(step) }) as unknown as RankResponse;

describe('setup draft', () => {
  it('reads numbers (comma or point), dates, yes/no and the idle screw; empty means not known', () => {
    const { setup, errors } = parseSetupDraft(
      { mainJet: ' 182,5 ', pilotJet: '', needleClipGroove: '3', idleScrew: 'set', idleScrewTurns: '1.5', foamFittedDate: '2026-03-01', ventLinesFitted: 'no', ventLinesRoutedUp: 'yes' },
      '2026-12-01',
    );
    expect(errors).toEqual({});
    // Routed up means nothing without vent lines fitted, so it is dropped.
    expect(setup).toEqual({ mainJet: 182.5, needleClipGroove: 3, idleScrew: 'set', idleScrewTurns: 1.5, foamFittedDate: '2026-03-01', ventLinesFitted: false });
  });

  it('keeps the idle screw turns only when the screw is set', () => {
    expect(parseSetupDraft({ idleScrew: 'backed-off', idleScrewTurns: '2' }).setup).toEqual({ idleScrew: 'backed-off' });
  });

  it('names every value it cannot take, with the range from the contract', () => {
    const { setup, errors } = parseSetupDraft(
      { mainJet: 'abc', pilotJet: '5', needleClipGroove: '8', airScrewTurnsOut: '7', premixRatio: '32', lastRebuildDate: '2026-12-02', foamFittedDate: '1/3/26' },
      '2026-12-01',
    );
    expect(Object.keys(errors).sort()).toEqual(['airScrewTurnsOut', 'foamFittedDate', 'lastRebuildDate', 'mainJet', 'needleClipGroove', 'pilotJet']);
    expect(errors.pilotJet).toMatch(/between 10 and 80/);
    expect(errors.lastRebuildDate).toMatch(/future/);
    expect(setup).toEqual({ premixRatio: 32 });
  });

  it('round-trips a stored snapshot into the draft', () => {
    const values = { mainJet: 185, airScrewTurnsOut: 1.75, idleScrew: 'backed-off' as const, ventLinesFitted: true, lastRebuildDate: '2026-03-01' };
    expect(parseSetupDraft(draftFromSetup(values), '2026-12-01')).toEqual({ setup: values, errors: {} });
  });

  it('sends only the details that were picked for a symptom', () => {
    expect(symptomsForRequest([{ id: 'a', band: [], engine: ['warm'] }, { id: 'b' }])).toEqual([{ id: 'a', engine: ['warm'] }, { id: 'b' }]);
  });
});

describe('plan order and navigation', () => {
  it('moves skipped checks to the end, in the order skipped, and forgets ones no longer planned', () => {
    expect(orderedPlan(rank(['a', 'b', 'c', 'd']), ['c', 'a', 'gone']).map((s) => s.checkId)).toEqual(['b', 'd', 'c', 'a']);
    expect(orderedPlan(null, ['a'])).toEqual([]);
  });

  it('Back: the check recorded before the current one, else the last recorded, else none', () => {
    const results = ['a', 'b', 'c'].map((checkId) => ({ checkId, result: 'looks-fine' as const, note: '' }));
    expect(previousCheckId(results, 'c')).toBe('b');
    expect(previousCheckId(results, 'a')).toBeNull();
    expect(previousCheckId(results, 'x')).toBe('c');
    expect(previousCheckId(results, null)).toBe('c');
    expect(previousCheckId([], 'x')).toBeNull();
  });

  it('recording a check again replaces its result and moves it to the end, like the case timeline', () => {
    const results = [
      { checkId: 'a', result: 'looks-fine' as const, note: '' },
      { checkId: 'b', result: 'looks-fine' as const, note: '' },
    ];
    expect(withResult(results, { checkId: 'a', result: 'fault-found', note: 'n' })).toEqual([
      { checkId: 'b', result: 'looks-fine', note: '' },
      { checkId: 'a', result: 'fault-found', note: 'n' },
    ]);
  });

  it('keeps an API error as plain data', () => {
    expect(toWalkThroughError(new ApiError(400, 'Bad', { 'setup.mainJet': ['too big'] }))).toEqual({ status: 400, message: 'Bad', fields: { 'setup.mainJet': ['too big'] } });
    expect(toWalkThroughError('boom')).toEqual({ status: 0, message: 'boom', fields: {} });
  });
});
