import { describe, expect, it } from 'vitest';
import {
  buckSaturationVapourPressureIcePa,
  buckSaturationVapourPressureWaterPa,
  enhancementFactor,
  moleFractionWaterVapour,
  saturationVapourPressurePa,
  vapourPressurePa,
} from './vapour.js';

// Saturation vapour pressure of water: IAPWS R7-97(2012), Revised Release on the IAPWS Industrial
// Formulation 1997 for the Thermodynamic Properties of Water and Steam (IAPWS-IF97), the
// saturation-pressure equation of Region 4 (eq. 30), written out here independently of the code
// under test. Its coefficients are checked against the values the release gives for that equation
// (table 35): 300 K 0.353658941e-2 MPa, 500 K 0.263889776e1 MPa, 600 K 0.123443146e2 MPa.
const IF97_N = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
  0.14915108613530e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;
function if97SaturationPressureMPa(kelvin: number): number {
  const [n1, n2, n3, n4, n5, n6, n7, n8, n9, n10] = IF97_N;
  const th = kelvin + n9 / (kelvin - n10);
  const a = th * th + n1 * th + n2;
  const b = n3 * th * th + n4 * th + n5;
  const c = n6 * th * th + n7 * th + n8;
  return ((2 * c) / (-b + Math.sqrt(b * b - 4 * a * c))) ** 4;
}
// The IAPWS-IF97 saturation pressures at 0 ... 40 C, kPa (from eq. 30, 5 significant figures):
const IAPWS_WATER_KPA: ReadonlyArray<[number, number]> = [
  [0, 0.61121],
  [10, 1.2282],
  [20, 2.3392],
  [30, 4.2467],
  [40, 7.3844],
];

describe('the IAPWS-IF97 reference written in this test', () => {
  it.each([
    [300, 0.353658941e-2],
    [500, 0.263889776e1],
    [600, 0.123443146e2],
  ])('gives the release\'s check value at %d K (IAPWS R7-97(2012), table 35)', (kelvin, mpa) => {
    // Nine significant figures: agreement within half a unit of the last one.
    expect(Math.abs(if97SaturationPressureMPa(kelvin) / mpa - 1)).toBeLessThan(5e-9);
  });

  it.each(IAPWS_WATER_KPA)('gives %d C: %s kPa (the table above)', (t, kPa) => {
    expect(if97SaturationPressureMPa(t + 273.15) * 1000).toBeCloseTo(kPa, 4);
  });
});

describe('saturation vapour pressure, CIPM-2007 (Davis 1992) formula', () => {
  // Tolerance 0.01 %: Davis (Metrologia 29 (1992) 67) fits the formula to better than 0.01 % at
  // 15-27 C; against IAPWS-IF97 it stays within 0.006 % from 0 to 40 C, while a wrong constant (a
  // sign, a digit in C or D) is off by far more.
  it.each(IAPWS_WATER_KPA)('at %d C matches IAPWS-IF97 within 0.01 %%', (t) => {
    const pa = saturationVapourPressurePa(t);
    expect(Math.abs(pa / (if97SaturationPressureMPa(t + 273.15) * 1e6) - 1)).toBeLessThan(1e-4);
  });

  it('rises monotonically with temperature from -20 to 50 C', () => {
    // Physics (Clausius-Clapeyron): saturation pressure increases with temperature.
    let last = 0;
    for (let t = -20; t <= 50; t += 0.5) {
      const p = saturationVapourPressurePa(t);
      expect(p).toBeGreaterThan(last);
      last = p;
    }
  });
});

describe('saturation vapour pressure, Buck (1981)', () => {
  // Buck, J. Appl. Meteorol. 20 (1981) 1527, e_w1 form: the paper gives errors of the order of
  // 0.1 % over its stated range (from memory); against IAPWS-IF97 (above) it is within 0.09 % from
  // 0 to 40 C, so 0.2 % leaves margin while a wrong constant fails.
  it.each(IAPWS_WATER_KPA)('over water at %d C is within 0.2 %% of IAPWS-IF97', (t) => {
    expect(Math.abs(buckSaturationVapourPressureWaterPa(t) / (if97SaturationPressureMPa(t + 273.15) * 1e6) - 1)).toBeLessThan(2e-3);
  });

  // Vapour pressure of ice: 259.9 Pa at -10 C and 103.3 Pa at -20 C (CRC Handbook, "Vapor pressure
  // of ice"; from memory). Tolerance 0.3 %.
  it.each([
    [-10, 259.9],
    [-20, 103.3],
  ])('over ice at %d C is within 0.3 %% of the CRC value', (t, pa) => {
    expect(Math.abs(buckSaturationVapourPressureIcePa(t) / pa - 1)).toBeLessThan(3e-3);
  });

  it('gives a lower pressure over ice than over supercooled water below 0 C', () => {
    // Physics: ice is the stable phase below 0 C, so its vapour pressure is the lower one.
    for (const t of [-1, -5, -10, -20, -30]) {
      expect(buckSaturationVapourPressureIcePa(t)).toBeLessThan(buckSaturationVapourPressureWaterPa(t));
    }
  });
});

describe('enhancement factor and mole fraction (CIPM-2007)', () => {
  it('f = 1.00062 + 3.14e-8 p + 5.6e-7 t^2', () => {
    // Picard et al., Metrologia 45 (2008) 149, enhancement factor equation: at 101325 Pa and 20 C,
    // f = 1.00062 + 0.0031816 + 0.000224 = 1.0040256 (arithmetic done by hand).
    expect(enhancementFactor(101325, 20)).toBeCloseTo(1.0040256, 7);
  });

  it('x_v = h f psv / p and the vapour pressure is x_v p', () => {
    // CIPM-2007 definition of the mole fraction of water vapour (Picard et al. 2008).
    const p = 95000;
    const t = 25;
    const xv = moleFractionWaterVapour(p, t, 60);
    expect(xv).toBeCloseTo((0.6 * enhancementFactor(p, t) * saturationVapourPressurePa(t)) / p, 12);
    expect(vapourPressurePa(p, t, 60)).toBeCloseTo(xv * p, 9);
    expect(moleFractionWaterVapour(p, t, 0)).toBe(0);
  });
});
