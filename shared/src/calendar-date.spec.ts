import { describe, expect, it } from 'vitest';
import { isCalendarDate, isNotInFuture, latestAllowedDate } from './calendar-date.js';

describe('calendar dates', () => {
  it('accepts real dates and refuses impossible ones', () => {
    expect(isCalendarDate('2026-02-28')).toBe(true);
    expect(isCalendarDate('2024-02-29')).toBe(true); // leap year (Gregorian rule, from memory)
    expect(isCalendarDate('2026-02-29')).toBe(false);
    expect(isCalendarDate('2026-13-01')).toBe(false);
    expect(isCalendarDate('2026-1-01')).toBe(false);
    expect(isCalendarDate('yesterday')).toBe(false);
    expect(isCalendarDate(20260101)).toBe(false);
  });

  it('allows up to one day past UTC today, so no time zone refuses its own today', () => {
    expect(latestAllowedDate(new Date('2026-12-01T23:30:00Z'))).toBe('2026-12-02');
  });

  it('reads only the date part of a date-time when checking for the future', () => {
    const now = new Date('2026-12-01T10:00:00Z');
    expect(isNotInFuture('2026-12-02', now)).toBe(true);
    expect(isNotInFuture('2026-12-02T23:59:00Z', now)).toBe(true);
    expect(isNotInFuture('2026-12-03', now)).toBe(false);
    expect(isNotInFuture('2027-01-01T00:00:00Z', now)).toBe(false);
  });
});
