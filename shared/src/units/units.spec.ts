import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_UNIT_PREFERENCES,
  HPA_PER_INHG,
  HPA_PER_MMHG,
  LENGTH_UNITS,
  M_PER_FT,
  PRESSURE_UNITS,
  TEMPERATURE_UNITS,
  formatDensity,
  formatLength,
  formatNumber,
  formatPercent,
  formatPressure,
  formatTemperature,
  fromCelsius,
  fromHectopascals,
  fromMetres,
  normalizeUnitPreferences,
  toCelsius,
  toHectopascals,
  toMetres,
} from './units.js';

const close = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));

describe('conversion factors', () => {
  it('uses the exact conventional factors', () => {
    // NIST SP 811 appendix B: conventional mmHg = 133.322 387 415 Pa; 1 ft = 0.3048 m exactly
    // (1959 international agreement); inHg conventional = 25.4 mmHg = 3386.388 640 341 Pa.
    expect(HPA_PER_MMHG).toBe(1.33322387415);
    expect(M_PER_FT).toBe(0.3048);
    expect(HPA_PER_INHG).toBeCloseTo(33.86388640341, 10);
  });

  it('matches well-known equivalences', () => {
    // ICAO standard altimeter setting: 1013.25 hPa = 29.92 inHg = 760 mmHg (to the digits shown).
    expect(fromHectopascals(1013.25, 'inHg')).toBeCloseTo(29.92, 2);
    expect(fromHectopascals(1013.25, 'mmHg')).toBeCloseTo(760.0, 1);
    expect(toHectopascals(101.325, 'kPa')).toBeCloseTo(1013.25, 10);
    // Water freezes at 32 F and boils at 212 F at one atmosphere (definition of the Fahrenheit scale).
    expect(toCelsius(32, 'F')).toBe(0);
    expect(toCelsius(212, 'F')).toBeCloseTo(100, 12);
    expect(fromCelsius(-40, 'F')).toBeCloseTo(-40, 12);
    // 1000 ft = 304.8 m (definition of the international foot).
    expect(toMetres(1000, 'ft')).toBeCloseTo(304.8, 10);
  });
});

describe('round trips (property)', () => {
  it('temperature, pressure and length survive to-and-from in every unit', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), fc.constantFrom(...TEMPERATURE_UNITS), (c, unit) => {
        expect(close(toCelsius(fromCelsius(c, unit), unit), c)).toBe(true);
        expect(close(fromCelsius(toCelsius(c, unit), unit), c)).toBe(true);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), fc.constantFrom(...PRESSURE_UNITS), (hpa, unit) => {
        expect(close(toHectopascals(fromHectopascals(hpa, unit), unit), hpa)).toBe(true);
        expect(close(fromHectopascals(toHectopascals(hpa, unit), unit), hpa)).toBe(true);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: -1000, max: 20000, noNaN: true }), fc.constantFrom(...LENGTH_UNITS), (m, unit) => {
        expect(close(toMetres(fromMetres(m, unit), unit), m)).toBe(true);
        expect(close(fromMetres(toMetres(m, unit), unit), m)).toBe(true);
      }),
    );
  });

  it('conversions between any two pressure units through hPa are consistent', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.constantFrom(...PRESSURE_UNITS),
        fc.constantFrom(...PRESSURE_UNITS),
        (v, a, b) => {
          const viaHpa = fromHectopascals(toHectopascals(v, a), b);
          const back = fromHectopascals(toHectopascals(viaHpa, b), a);
          expect(close(back, v)).toBe(true);
        },
      ),
    );
  });
});

describe('formatting', () => {
  it('formats in the preferred unit with default decimals', () => {
    expect(formatTemperature(20, 'C')).toBe('20.0 °C');
    expect(formatTemperature(20, 'F')).toBe('68.0 °F');
    expect(formatPressure(1013.25, 'hPa')).toBe('1013.3 hPa');
    expect(formatPressure(1013.25, 'inHg')).toBe('29.92 inHg');
    expect(formatPressure(1013.25, 'kPa')).toBe('101.33 kPa');
    expect(formatLength(500, 'ft')).toBe('1640 ft');
    expect(formatDensity(1.18412)).toBe('1.184 kg/m³');
    expect(formatPercent(96.44)).toBe('96.4 %');
    expect(formatPressure(1000, 'mmHg', { decimals: 0, withUnit: false })).toBe('750');
  });

  it('never prints "-0" and shows a dash for non-numbers', () => {
    expect(formatNumber(-0.01, 1)).toBe('0.0');
    expect(formatNumber(-0, 0)).toBe('0');
    expect(formatNumber(-0.06, 1)).toBe('-0.1');
    expect(formatTemperature(Number.NaN, 'C')).toBe('–');
  });
});

describe('preferences', () => {
  it('defaults to C, hPa, m and falls back field by field', () => {
    expect(DEFAULT_UNIT_PREFERENCES).toEqual({ temperature: 'C', pressure: 'hPa', length: 'm' });
    expect(normalizeUnitPreferences({ temperature: 'F', pressure: 'psi', length: 'ft' })).toEqual({ temperature: 'F', pressure: 'hPa', length: 'ft' });
    expect(normalizeUnitPreferences(null)).toEqual(DEFAULT_UNIT_PREFERENCES);
  });
});
