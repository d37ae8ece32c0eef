import { describe, expect, it } from 'vitest';
import { j1349CorrectionFactor, j1349Warnings } from './j1349.js';

describe('SAE J1349 power correction factor', () => {
  it('is 1 at the reference conditions, 25 C and 99 kPa dry-air pressure', () => {
    // SAE J1349 (JUN1990) reference conditions (from memory).
    expect(j1349CorrectionFactor(99, 25)).toBeCloseTo(1, 12);
  });

  it('follows CF = 1.18 (99/Pd) sqrt((t+273)/298) - 0.18', () => {
    // SAE J1349 (JUN1990) spark-ignition equation (from memory), evaluated separately:
    // Pd = 95 kPa, t = 35 C: 1.18 * (99/95 = 1.0421053) * (sqrt(308/298) = 1.0166390) - 0.18 = 1.0701463.
    expect(j1349CorrectionFactor(95, 35)).toBeCloseTo(1.0701463, 6);
    // Colder, denser air gives a factor below 1 (observed power is corrected down).
    expect(j1349CorrectionFactor(101, 10)).toBeLessThan(1);
  });

  it('warns outside 15..35 C and 90..105 kPa, and not inside', () => {
    // Limits of the correction in SAE J1349 (from memory).
    expect(j1349Warnings(99, 25)).toEqual([]);
    expect(j1349Warnings(99, 10)).toHaveLength(1);
    expect(j1349Warnings(85, 25)).toHaveLength(1);
    expect(j1349Warnings(110, 40)).toHaveLength(2);
  });
});
