import { describe, expect, it } from 'vitest';
import { compressibilityFactor, dryAirMolarMass, moistAirCipm2007, moistAirDensity } from './cipm2007.js';

/**
 * An independent transcription of the CIPM-2007 equations (Picard, Davis, Glaser, Fujii,
 * Metrologia 45 (2008) 149-155, the equations as the paper states them), written here from the paper and not using the
 * production code, to compute the expected values.
 */
function cipm2007Reference(tC: number, pPa: number, hFraction: number, xCO2 = 0.0004) {
  const TK = tC + 273.15;
  // saturation vapour pressure (Pa)
  const psv = Math.exp(1.2378847e-5 * TK ** 2 - 1.9121316e-2 * TK + 33.93711047 - 6.3431645e3 / TK);
  // enhancement factor
  const f = 1.00062 + 3.14e-8 * pPa + 5.6e-7 * tC ** 2;
  // mole fraction of water vapour
  const xv = (hFraction * f * psv) / pPa;
  // compressibility factor
  const Z =
    1 -
    (pPa / TK) *
      (1.58123e-6 - 2.9331e-8 * tC + 1.1043e-10 * tC ** 2 + (5.707e-6 - 2.051e-8 * tC) * xv + (1.9898e-4 - 2.376e-6 * tC) * xv ** 2) +
    (pPa / TK) ** 2 * (1.83e-11 - 0.765e-8 * xv ** 2);
  // molar mass of dry air (kg/mol), water 18.01528 g/mol, R = 8.314472 J/(mol K)
  const Ma = (28.96546 + 12.011 * (xCO2 - 0.0004)) / 1000;
  const Mv = 18.01528 / 1000;
  const rho = ((pPa * Ma) / (Z * 8.314472 * TK)) * (1 - xv * (1 - Mv / Ma));
  return { rho, Z, xv, psv, f };
}

describe('moist air density, CIPM-2007', () => {
  it('at 20 C, 101325 Pa, 50 % RH equals the independent computation from the paper', () => {
    // Source: Picard et al., Metrologia 45 (2008) 149, equations recomputed above.
    const expected = cipm2007Reference(20, 101325, 0.5);
    const got = moistAirCipm2007(20, 101325, 50);
    expect(got.densityKgM3).toBeCloseTo(expected.rho, 10);
    expect(got.compressibility).toBeCloseTo(expected.Z, 12);
    expect(got.moleFractionVapour).toBeCloseTo(expected.xv, 12);
    // Sanity: air at 20 C and one atmosphere is about 1.20 kg/m3 (from memory).
    expect(got.densityKgM3).toBeGreaterThan(1.19);
    expect(got.densityKgM3).toBeLessThan(1.21);
  });

  it.each([
    [-20, 60000, 0],
    [-5, 85000, 90],
    [15, 95000, 20],
    [27, 110000, 100],
    [45, 70000, 75],
  ])('at %d C, %d Pa, %d %% RH equals the independent computation', (t, p, rh) => {
    // Source: Picard et al. (2008), as transcribed above.
    const expected = cipm2007Reference(t, p, rh / 100);
    expect(moistAirDensity(t, p, rh)).toBeCloseTo(expected.rho, 10);
  });

  it('the CO2 term adds 12.011 g/mol per unit mole fraction above 0.0004', () => {
    // CIPM-2007 equation for M_a (Picard et al. 2008, section 3).
    expect(dryAirMolarMass(0.0004)).toBeCloseTo(28.96546e-3, 12);
    expect(dryAirMolarMass(0.0005)).toBeCloseTo((28.96546 + 0.0012011) * 1e-3, 12);
    const p = 100000;
    expect(moistAirDensity(20, p, 40, 0.0005)).toBeCloseTo(cipm2007Reference(20, p, 0.4, 0.0005).rho, 10);
  });

  it('Z of dry air at 20 C and 101325 Pa is about 0.9996', () => {
    // Physics: the second virial coefficient of air near room temperature makes it slightly more
    // compressible than an ideal gas, Z - 1 of the order of -4e-4 (from memory).
    expect(compressibilityFactor(101325, 20, 0)).toBeCloseTo(0.99960, 4);
  });

  it('humid air is lighter than dry air at the same temperature and pressure', () => {
    // Physics: water (18 g/mol) replaces dry air (29 g/mol) molecule for molecule (Avogadro).
    const dry = moistAirCipm2007(30, 100000, 0);
    const wet = moistAirCipm2007(30, 100000, 100);
    expect(wet.densityKgM3).toBeLessThan(dry.densityKgM3);
    expect(wet.dryAirDensityKgM3).toBeLessThan(wet.densityKgM3);
    expect(dry.dryAirDensityKgM3).toBe(dry.densityKgM3);
  });

  it('the dry-air and vapour partial densities add up to the total, split by x_i M_i', () => {
    // Definition of partial density in a mixture (Dalton); molar masses from CIPM-2007.
    const s = moistAirCipm2007(25, 98000, 70);
    expect(s.dryAirDensityKgM3 + s.vapourDensityKgM3).toBeCloseTo(s.densityKgM3, 12);
    const ratio = s.vapourDensityKgM3 / s.dryAirDensityKgM3;
    expect(ratio).toBeCloseTo((s.moleFractionVapour * 18.01528) / ((1 - s.moleFractionVapour) * 28.96546), 10);
    expect(s.vapourPressurePa + s.dryAirPressurePa).toBeCloseTo(98000, 8);
  });
});
