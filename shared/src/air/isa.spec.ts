import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  ISA,
  densityAltitudeM,
  geometricFromGeopotential,
  geopotentialFromGeometric,
  isaAtGeopotential,
  pressureAltitudeM,
  qnhFromStationPressure,
  stationPressureFromQnh,
} from './isa.js';

describe('ISA troposphere at geopotential altitudes', () => {
  // ICAO Doc 7488/3 (Manual of the ICAO Standard Atmosphere) / ISO 2533, table by geopotential
  // altitude H: T, p and rho to the digits the table prints (from memory).
  it.each([
    [0, 288.15, 101325, 1.225],
    [1000, 281.65, 89874.6, 1.11164],
    [2000, 275.15, 79495.2, 1.00649],
  ])('at H = %d m: T = %f K, p = %f Pa, rho = %f kg/m3', (H, T, p, rho) => {
    const s = isaAtGeopotential(H);
    expect(s.temperatureK).toBeCloseTo(T, 6);
    expect(Math.abs(s.pressurePa - p)).toBeLessThan(0.05); // table gives 0.1 Pa
    expect(Math.abs(s.densityKgM3 - rho)).toBeLessThan(5e-6); // table gives 6 figures
  });

  it('the tropopause at 11 000 m is 216.65 K and 22 632 Pa', () => {
    // ICAO Doc 7488/3 / ISO 2533: tropopause values (from memory: 216.65 K, 22632.1 Pa, 0.36392 kg/m3).
    const s = isaAtGeopotential(11000);
    expect(s.temperatureK).toBeCloseTo(216.65, 6);
    expect(Math.abs(s.pressurePa - 22632.1)).toBeLessThan(0.2);
    expect(Math.abs(s.densityKgM3 - 0.36392)).toBeLessThan(1e-5);
  });
});

describe('ISA at geometric altitudes', () => {
  // U.S. Standard Atmosphere 1976 (identical to the ISA below 32 km), table by GEOMETRIC altitude
  // z: 1000 m: 281.651 K, 89 876 Pa, 1.1117 kg/m3; 2000 m: 275.154 K, 79 501 Pa, 1.0066 kg/m3
  // (from memory).
  it.each([
    [1000, 281.651, 89876, 1.1117],
    [2000, 275.154, 79501, 1.0066],
  ])('at z = %d m', (z, T, p, rho) => {
    const s = isaAtGeopotential(geopotentialFromGeometric(z));
    expect(Math.abs(s.temperatureK - T)).toBeLessThan(5e-4);
    expect(Math.abs(s.pressurePa - p)).toBeLessThan(0.5);
    expect(Math.abs(s.densityKgM3 - rho)).toBeLessThan(5e-5);
  });

  it('geometric and geopotential convert back and forth with r = 6 356 766 m', () => {
    // ISO 2533: H = r z / (r + z).
    expect(geopotentialFromGeometric(2000)).toBeCloseTo((6356766 * 2000) / (6356766 + 2000), 9);
    fc.assert(
      fc.property(fc.double({ min: -5000, max: 20000, noNaN: true }), (z) => {
        expect(geometricFromGeopotential(geopotentialFromGeometric(z))).toBeCloseTo(z, 6);
      }),
    );
  });
});

describe('density altitude and pressure altitude', () => {
  it('the density altitude of ISA density at H is H (troposphere closed form and isothermal layer)', () => {
    // Definition: the ISA altitude whose density equals the given one (ICAO Doc 7488 relations).
    fc.assert(
      fc.property(fc.double({ min: -2000, max: 20000, noNaN: true }), (H) => {
        expect(densityAltitudeM(isaAtGeopotential(H).densityKgM3)).toBeCloseTo(H, 6);
      }),
    );
    expect(densityAltitudeM(1.225)).toBeCloseTo(0, 1);
  });

  it('the pressure altitude of ISA pressure at H is H', () => {
    // Definition of pressure altitude (ICAO Doc 7488 troposphere law).
    for (const H of [-500, 0, 500, 1500, 3000, 9000]) {
      expect(pressureAltitudeM(isaAtGeopotential(H).pressurePa)).toBeCloseTo(H, 6);
    }
  });
});

describe('station pressure from QNH', () => {
  it('with QNH = 1013.25 hPa it is the ISA pressure at the elevation', () => {
    // Definition of QNH: an ISA-calibrated altimeter set to it reads the elevation on the ground.
    for (const H of [0, 250, 1000, 2000]) {
      expect(stationPressureFromQnh(ISA.p0, H)).toBeCloseTo(isaAtGeopotential(H).pressurePa, 6);
    }
  });

  it('an altimeter set to QNH reads the elevation: Hp(p_station) - Hp(QNH) = H', () => {
    // Altimeter principle (ICAO definition of QNH; the U.S. NWS altimeter-setting relation).
    fc.assert(
      fc.property(fc.double({ min: 950, max: 1050, noNaN: true }), fc.double({ min: -400, max: 3000, noNaN: true }), (qnhHpa, H) => {
        const p = stationPressureFromQnh(qnhHpa * 100, H);
        expect(pressureAltitudeM(p) - pressureAltitudeM(qnhHpa * 100)).toBeCloseTo(H, 5);
        expect(qnhFromStationPressure(p, H)).toBeCloseTo(qnhHpa * 100, 5);
      }),
    );
  });

  it('returns NaN when no positive pressure fits', () => {
    expect(stationPressureFromQnh(50000, 60000)).toBeNaN();
  });
});
