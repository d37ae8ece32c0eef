import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AirInputError, computeAir, densityChangePct, isAirInputError, relativeAirDensityPct, type AirRequest } from './compute-air.js';
import { moistAirCipm2007 } from './cipm2007.js';
import { isaAtGeopotential, geopotentialFromGeometric, stationPressureFromQnh } from './isa.js';
import { j1349CorrectionFactor } from './j1349.js';

function fieldOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    if (isAirInputError(e)) return e.field;
    throw e;
  }
  return undefined;
}

describe('computeAir', () => {
  it('reports density, dry-air density, vapour pressure and the station pressure used', () => {
    // CIPM-2007 (Picard et al. 2008) through moistAirCipm2007, checked in cipm2007.spec.ts.
    const r = computeAir({ temperatureC: 20, stationPressureHpa: 1013.25, relativeHumidityPct: 50 });
    const air = moistAirCipm2007(20, 101325, 50);
    expect(r.densityKgM3).toBe(air.densityKgM3);
    expect(r.dryAirDensityKgM3).toBe(air.dryAirDensityKgM3);
    expect(r.vaporPressureHpa).toBeCloseTo(air.vapourPressurePa / 100, 12);
    // Vapour pressure at 20 C, 50 % RH is about half of 23.39 hPa times f = 1.004 (IAPWS-IF97
    // saturation pressure 2.3392 kPa, see vapour.spec.ts; CIPM-2007 enhancement factor): 11.74 hPa.
    expect(r.vaporPressureHpa).toBeCloseTo(11.74, 2);
    expect(r.stationPressureHpa).toBe(1013.25);
    expect(r.reference).toBe('isa-sea-level');
    expect(r.relativeAirDensityPct).toBeCloseTo((100 * air.densityKgM3) / 1.225, 10);
    expect(r.powerCorrectionFactor).toBeCloseTo(j1349CorrectionFactor(air.dryAirPressurePa / 1000, 20), 12);
    expect(r.warnings).toEqual([]);
  });

  it('the density altitude of ISA conditions (dry air) is the altitude, within 6 m', () => {
    // ICAO Doc 7488 / ISO 2533 for T and p at H. CIPM-2007 treats air as a real gas (Z about 0.9996)
    // with a molar mass of 28.96546 g/mol where the ISA uses an ideal gas of 28.9644 g/mol, so real
    // dry air at ISA T and p is about 0.04 % denser, which is about 4 m of density altitude.
    for (const H of [0, 500, 1000, 2000, 3000]) {
      const isa = isaAtGeopotential(H);
      const r = computeAir({ temperatureC: isa.temperatureK - 273.15, stationPressureHpa: isa.pressurePa / 100, relativeHumidityPct: 0 });
      expect(Math.abs(r.densityAltitudeM - H)).toBeLessThan(6);
      expect(r.densityKgM3 / isa.densityKgM3 - 1).toBeGreaterThan(0);
      expect(r.densityKgM3 / isa.densityKgM3 - 1).toBeLessThan(6e-4);
    }
  });

  it('hot humid air has a density altitude far above the track', () => {
    // Physics: at 35 C and 80 % RH at sea level the air is about 8 % thinner than ISA, which is
    // roughly 700-800 m of density altitude (about 1 % per 100 m near sea level; ISA table).
    const r = computeAir({ temperatureC: 35, stationPressureHpa: 1013.25, relativeHumidityPct: 80 });
    expect(r.densityAltitudeM).toBeGreaterThan(700);
    expect(r.densityAltitudeM).toBeLessThan(1000);
    expect(r.relativeAirDensityPct).toBeLessThan(93);
  });

  it('takes altitude plus sea-level pressure (QNH) and derives the station pressure', () => {
    // Altimeter-setting relation in isa.ts (QNH definition), elevation geometric -> geopotential.
    const r = computeAir({ temperatureC: 18, altitudeM: 450, seaLevelPressureHpa: 1020, relativeHumidityPct: 55 });
    expect(r.stationPressureHpa).toBeCloseTo(stationPressureFromQnh(102000, geopotentialFromGeometric(450)) / 100, 9);
    // About 12 hPa per 100 m near sea level (ISA): 450 m is roughly 53 hPa below QNH.
    expect(1020 - r.stationPressureHpa).toBeGreaterThan(50);
    expect(1020 - r.stationPressureHpa).toBeLessThan(56);
    const direct = computeAir({ temperatureC: 18, stationPressureHpa: r.stationPressureHpa, relativeHumidityPct: 55 });
    expect(direct.densityKgM3).toBeCloseTo(r.densityKgM3, 12);
  });

  it('measures relative air density against a baseline day when asked', () => {
    const baseline = computeAir({ temperatureC: 12, stationPressureHpa: 1005, relativeHumidityPct: 70 });
    const today = computeAir({
      temperatureC: 28,
      stationPressureHpa: 1005,
      relativeHumidityPct: 40,
      reference: { kind: 'baseline', densityKgM3: baseline.densityKgM3 },
    });
    expect(today.reference).toBe('baseline');
    expect(today.referenceDensityKgM3).toBe(baseline.densityKgM3);
    expect(today.relativeAirDensityPct).toBeCloseTo((100 * today.densityKgM3) / baseline.densityKgM3, 10);
    // Physics: 16 K warmer at the same pressure is about 5.6 % thinner (ideal gas, 285/301).
    expect(today.relativeAirDensityPct).toBeGreaterThan(93.5);
    expect(today.relativeAirDensityPct).toBeLessThan(95);
  });

  it('answers outside the valid ranges, with a warning for each', () => {
    const cold = computeAir({ temperatureC: -25, stationPressureHpa: 1000, relativeHumidityPct: 50 });
    expect(cold.densityKgM3).toBeGreaterThan(1.3);
    expect(cold.warnings.some((w) => w.includes('-25.0 C'))).toBe(true);
    const low = computeAir({ temperatureC: 20, stationPressureHpa: 550, relativeHumidityPct: 50 });
    expect(low.warnings.some((w) => w.includes('550.0 hPa'))).toBe(true);
    const high = computeAir({ temperatureC: 10, altitudeM: 12000, seaLevelPressureHpa: 1013.25, relativeHumidityPct: 10 });
    expect(high.warnings.some((w) => w.includes('12000 m'))).toBe(true);
    const both = computeAir({ temperatureC: 20, stationPressureHpa: 990, altitudeM: 100, seaLevelPressureHpa: 1000, relativeHumidityPct: 50 } as unknown as AirRequest);
    expect(both.stationPressureHpa).toBe(990);
    expect(both.warnings.some((w) => w.includes('not used'))).toBe(true);
  });

  it('throws AirInputError naming the field for impossible input', () => {
    expect(fieldOf(() => computeAir({ temperatureC: Number.NaN, stationPressureHpa: 1000, relativeHumidityPct: 50 }))).toBe('temperatureC');
    expect(fieldOf(() => computeAir({ temperatureC: -300, stationPressureHpa: 1000, relativeHumidityPct: 50 }))).toBe('temperatureC');
    expect(fieldOf(() => computeAir({ temperatureC: 20, stationPressureHpa: 0, relativeHumidityPct: 50 }))).toBe('stationPressureHpa');
    expect(fieldOf(() => computeAir({ temperatureC: 20, stationPressureHpa: Infinity, relativeHumidityPct: 50 }))).toBe('stationPressureHpa');
    expect(fieldOf(() => computeAir({ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: -1 }))).toBe('relativeHumidityPct');
    expect(fieldOf(() => computeAir({ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 100.5 }))).toBe('relativeHumidityPct');
    expect(fieldOf(() => computeAir({ temperatureC: 20, altitudeM: 100, seaLevelPressureHpa: -5, relativeHumidityPct: 50 }))).toBe('seaLevelPressureHpa');
    expect(fieldOf(() => computeAir({ temperatureC: 20, altitudeM: 100, relativeHumidityPct: 50 } as unknown as AirRequest))).toBe('seaLevelPressureHpa');
    expect(fieldOf(() => computeAir({ temperatureC: 20, relativeHumidityPct: 50 } as unknown as AirRequest))).toBe('stationPressureHpa');
    expect(fieldOf(() => computeAir({ temperatureC: 20, altitudeM: 60000, seaLevelPressureHpa: 1013, relativeHumidityPct: 50 }))).toBe('altitudeM');
    expect(
      fieldOf(() => computeAir({ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 50, reference: { kind: 'baseline', densityKgM3: 0 } })),
    ).toBe('reference.densityKgM3');
    expect(() => computeAir({ temperatureC: 20, stationPressureHpa: 1000, relativeHumidityPct: 101 })).toThrow(AirInputError);
  });

  it('stays finite with warnings over any input inside the wide plausible box', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -40, max: 60, noNaN: true }),
        fc.double({ min: 500, max: 1200, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (t, p, rh) => {
          const r = computeAir({ temperatureC: t, stationPressureHpa: p, relativeHumidityPct: rh });
          for (const v of [r.densityKgM3, r.dryAirDensityKgM3, r.vaporPressureHpa, r.densityAltitudeM, r.relativeAirDensityPct, r.powerCorrectionFactor]) {
            expect(Number.isFinite(v)).toBe(true);
          }
          expect(r.dryAirDensityKgM3).toBeLessThanOrEqual(r.densityKgM3);
        },
      ),
    );
  });
});

describe('densityChangePct and relativeAirDensityPct', () => {
  it('is positive when today is denser and negative when thinner', () => {
    expect(densityChangePct(1.2, 1.26)).toBeCloseTo(5, 10);
    expect(densityChangePct(1.2, 1.14)).toBeCloseTo(-5, 10);
    expect(densityChangePct(1.2, 1.2)).toBe(0);
  });

  it('relative air density defaults to ISA sea level, 1.225 kg/m3 (ICAO Doc 7488)', () => {
    expect(relativeAirDensityPct(1.225)).toBeCloseTo(100, 12);
    expect(relativeAirDensityPct(1.1025, 1.225)).toBeCloseTo(90, 10);
  });
});
