/**
 * Density of moist air by the CIPM-2007 equation: A. Picard, R. S. Davis, M. Glaser, K. Fujii,
 * "Revised formula for the density of moist air (CIPM-2007)", Metrologia 45 (2008) 149-155.
 *
 *   rho_a = p M_a / (Z R T) * [1 - x_v (1 - M_v / M_a)]
 *
 * with M_a = [28.96546 + 12.011 (x_CO2 - 0.0004)] g/mol, M_v = 18.01528 g/mol, R = 8.314472 J/(mol K),
 * Z the compressibility factor below and x_v the mole fraction of water vapour (./vapour.ts).
 * The paper states the equation for 600..1100 hPa and 15..27 C; `computeAir` uses it over a wider
 * range and says so in its warnings.
 */
import { KELVIN_AT_ZERO_CELSIUS, moleFractionWaterVapour, saturationVapourPressurePa, enhancementFactor } from './vapour.js';

/** Molar gas constant used by CIPM-2007 (CODATA 2006), J/(mol K). */
export const CIPM_R = 8.314472;
/** Molar mass of water, kg/mol (CIPM-2007). */
export const CIPM_MV = 18.01528e-3;
/** Default mole fraction of CO2 in the CIPM-2007 equation. */
export const DEFAULT_CO2_MOLE_FRACTION = 0.0004;

/** CIPM-2007 compressibility constants (t in C, T in K, p in Pa). */
export const CIPM_Z = {
  a0: 1.58123e-6, // K Pa^-1
  a1: -2.9331e-8, // Pa^-1
  a2: 1.1043e-10, // K^-1 Pa^-1
  b0: 5.707e-6, // K Pa^-1
  b1: -2.051e-8, // Pa^-1
  c0: 1.9898e-4, // K Pa^-1
  c1: -2.376e-6, // Pa^-1
  d: 1.83e-11, // K^2 Pa^-2
  e: -0.765e-8, // K^2 Pa^-2
} as const;

/** Molar mass of dry air, kg/mol, for a CO2 mole fraction (CIPM-2007, argon value of 2002). */
export function dryAirMolarMass(co2MoleFraction: number = DEFAULT_CO2_MOLE_FRACTION): number {
  return (28.96546 + 12.011 * (co2MoleFraction - 0.0004)) * 1e-3;
}

/** Compressibility factor Z of moist air (CIPM-2007). */
export function compressibilityFactor(pressurePa: number, temperatureC: number, moleFractionVapour: number): number {
  const { a0, a1, a2, b0, b1, c0, c1, d, e } = CIPM_Z;
  const t = temperatureC;
  const T = t + KELVIN_AT_ZERO_CELSIUS;
  const xv = moleFractionVapour;
  const pT = pressurePa / T;
  return 1 - pT * (a0 + a1 * t + a2 * t * t + (b0 + b1 * t) * xv + (c0 + c1 * t) * xv * xv) + pT * pT * (d + e * xv * xv);
}

export interface MoistAirState {
  /** Total density of the moist air, kg/m3. */
  densityKgM3: number;
  /** Partial density of the dry-air component, kg/m3: rho_a (1 - x_v) M_a / [M_a (1 - x_v) + M_v x_v]. */
  dryAirDensityKgM3: number;
  /** Partial density of the water vapour, kg/m3. */
  vapourDensityKgM3: number;
  /** Partial pressure of water vapour x_v p, Pa. */
  vapourPressurePa: number;
  /** Partial pressure of the dry air (1 - x_v) p, Pa. */
  dryAirPressurePa: number;
  saturationVapourPressurePa: number;
  enhancementFactor: number;
  moleFractionVapour: number;
  compressibility: number;
}

/**
 * Moist-air density and its parts by CIPM-2007. Temperature in C, pressure in Pa (absolute station
 * pressure), relative humidity in % (0..100, against liquid water).
 */
export function moistAirCipm2007(
  temperatureC: number,
  pressurePa: number,
  relativeHumidityPct: number,
  co2MoleFraction: number = DEFAULT_CO2_MOLE_FRACTION,
): MoistAirState {
  const T = temperatureC + KELVIN_AT_ZERO_CELSIUS;
  const psv = saturationVapourPressurePa(temperatureC);
  const f = enhancementFactor(pressurePa, temperatureC);
  const xv = moleFractionWaterVapour(pressurePa, temperatureC, relativeHumidityPct);
  const Z = compressibilityFactor(pressurePa, temperatureC, xv);
  const Ma = dryAirMolarMass(co2MoleFraction);
  const density = ((pressurePa * Ma) / (Z * CIPM_R * T)) * (1 - xv * (1 - CIPM_MV / Ma));
  // The mixture's mass splits between the components in the ratio of x_i M_i.
  const dryMassFraction = ((1 - xv) * Ma) / ((1 - xv) * Ma + xv * CIPM_MV);
  return {
    densityKgM3: density,
    dryAirDensityKgM3: density * dryMassFraction,
    vapourDensityKgM3: density * (1 - dryMassFraction),
    vapourPressurePa: xv * pressurePa,
    dryAirPressurePa: (1 - xv) * pressurePa,
    saturationVapourPressurePa: psv,
    enhancementFactor: f,
    moleFractionVapour: xv,
    compressibility: Z,
  };
}

/** Moist-air density, kg/m3, by CIPM-2007 (shorthand for `moistAirCipm2007(...).densityKgM3`). */
export function moistAirDensity(
  temperatureC: number,
  pressurePa: number,
  relativeHumidityPct: number,
  co2MoleFraction: number = DEFAULT_CO2_MOLE_FRACTION,
): number {
  return moistAirCipm2007(temperatureC, pressurePa, relativeHumidityPct, co2MoleFraction).densityKgM3;
}
