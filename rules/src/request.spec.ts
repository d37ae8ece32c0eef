import { describe, expect, it } from 'vitest';
import { latestAllowedDate } from '@fuelwright/shared';
import { engine } from './test-support/shipped.js';

const DAY_MS = 24 * 3600 * 1000;
const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

describe('rank request: setup dates', () => {
  it('refuses a foam-fitted or rebuild date in the future, naming each field', () => {
    const future = isoDay(Date.parse(latestAllowedDate()) + DAY_MS);
    const v = engine.validateRankRequest({
      symptoms: ['sporadic-running'],
      setup: { carburettorKind: 'pump-around', foamFittedDate: future, lastRebuildDate: `${future}T08:00:00Z` },
    });
    expect(v.ok).toBe(false);
    expect(v.fields).toEqual({
      'setup.foamFittedDate': ['must not be in the future'],
      'setup.lastRebuildDate': ['must not be in the future'],
    });
    expect(v.message).toMatch(/setup\.foamFittedDate/);
  });

  it('accepts today, the one-day allowance for time zones east of UTC, and past dates', () => {
    const today = isoDay(Date.now());
    for (const date of [today, latestAllowedDate(), '2025-06-01']) {
      const v = engine.validateRankRequest({ symptoms: ['sporadic-running'], setup: { foamFittedDate: date, lastRebuildDate: date } });
      expect(v.fields).toEqual({});
      expect(v.ok).toBe(true);
      expect(v.request?.setup).toEqual({ foamFittedDate: date, lastRebuildDate: date });
    }
  });

  it('still refuses a date that is not a date', () => {
    const v = engine.validateRankRequest({ symptoms: [], setup: { foamFittedDate: '2026-02-30', lastRebuildDate: 'last spring' } });
    expect(Object.keys(v.fields).sort()).toEqual(['setup.foamFittedDate', 'setup.lastRebuildDate']);
  });
});
