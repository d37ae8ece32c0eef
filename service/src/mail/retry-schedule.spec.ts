import { describe, expect, it } from 'vitest';
import { backoffMs, KEEP_TRYING_MS, LONGEST_WAIT_MS, MAX_ATTEMPTS } from './retry-schedule.js';

// The schedule is a product choice (keep trying for a day, at most hourly): common practice for
// mail queues, no published source.
describe('the retry schedule of the outbox', () => {
  const waits = Array.from({ length: MAX_ATTEMPTS - 1 }, (_, i) => backoffMs(i + 1));

  it('starts at 30 s and doubles up to one hour between tries', () => {
    expect(waits.slice(0, 8)).toEqual([30_000, 60_000, 120_000, 240_000, 480_000, 960_000, 1_920_000, 3_600_000]);
    expect(Math.max(...waits)).toBe(LONGEST_WAIT_MS);
    expect(backoffMs(1000)).toBe(LONGEST_WAIT_MS);
  });

  it('keeps retrying for at least 24 hours, and gives up within the hour after', () => {
    const total = waits.reduce((a, b) => a + b, 0);
    expect(total).toBeGreaterThanOrEqual(KEEP_TRYING_MS);
    expect(KEEP_TRYING_MS).toBe(24 * 3_600_000);
    expect(total - waits[waits.length - 1]).toBeLessThan(KEEP_TRYING_MS);
    // 30 s + 1 + 2 + 4 + 8 + 16 + 32 min = 63.5 min, then 23 hourly waits: 31 tries in all.
    expect(MAX_ATTEMPTS).toBe(31);
  });
});
