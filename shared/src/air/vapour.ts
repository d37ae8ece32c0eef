/**
 * Water vapour in air: saturation vapour pressure, the enhancement factor and the mole fraction
 * of water vapour.
 *
 * Main formula (used by `computeAir`): the CIPM-2007 equations, A. Picard, R. S. Davis, M. Glaser,
 * K. Fujii, "Revised formula for the density of moist air (CIPM-2007)", Metrologia 45 (2008) 149-155,
 * which keep the saturation vapour pressure and enhancement factor of R. S. Davis, "Equation for the
 * determination of the density of moist air (1981/91)", Metrologia 29 (1992) 67-70.
 *
 * Secondary formulas: A. L. Buck, "New equations for computing vapor pressure and enhancement
 * factor", J. Appl. Meteorol. 20 (1981) 1527-1532, over water (the e_w1 form) and over ice
 * (the e_i1 form), for values below 0 C where a frost point matters.
 *
 * Pure functions, SI units unless the name says otherwise.
 */

export const KELVIN_AT_ZERO_CELSIUS = 273.15;

/** CIPM-2007 (Davis 1992) saturation vapour pressure constants, psv = 1 Pa * exp(A T^2 + B T + C + D / T). */
export const CIPM_PSV = {
  A: 1.2378847e-5, // K^-2
  B: -1.9121316e-2, // K^-1
  C: 33.93711047,
  D: -6.3431645e3, // K
} as const;

/** CIPM-2007 enhancement factor constants, f = alpha + beta p + gamma t^2 (p in Pa, t in C). */
export const CIPM_ENHANCEMENT = {
  alpha: 1.00062,
  beta: 3.14e-8, // Pa^-1
  gamma: 5.6e-7, // K^-2
} as const;

/**
 * Saturation vapour pressure of pure water (over liquid water), in Pa, by the CIPM-2007 formula.
 * The paper states it for the 15..27 C range of the density equation; it stays within about 0.1 %
 * of the IAPWS values from 0 to 40 C (see the tests) and is used here over -20..50 C, over
 * supercooled water below 0 C (relative humidity is reported against water by weather services,
 * WMO-No. 8).
 */
export function saturationVapourPressurePa(temperatureC: number): number {
  const T = temperatureC + KELVIN_AT_ZERO_CELSIUS;
  const { A, B, C, D } = CIPM_PSV;
  return Math.exp(A * T * T + B * T + C + D / T);
}

/** Buck (1981) saturation vapour pressure over plane water, e_w1 form, in Pa (stated for -40..50 C). */
export function buckSaturationVapourPressureWaterPa(temperatureC: number): number {
  return 100 * 6.1121 * Math.exp((17.502 * temperatureC) / (240.97 + temperatureC));
}

/** Buck (1981) saturation vapour pressure over ice, e_i1 form, in Pa (stated for -50..0 C). */
export function buckSaturationVapourPressureIcePa(temperatureC: number): number {
  return 100 * 6.1115 * Math.exp((22.452 * temperatureC) / (272.55 + temperatureC));
}

/** CIPM-2007 enhancement factor f(p, t) of water vapour in air (dimensionless). */
export function enhancementFactor(pressurePa: number, temperatureC: number): number {
  const { alpha, beta, gamma } = CIPM_ENHANCEMENT;
  return alpha + beta * pressurePa + gamma * temperatureC * temperatureC;
}

/** Partial pressure of water vapour, in Pa: h * f * psv (CIPM-2007, x_v * p). */
export function vapourPressurePa(pressurePa: number, temperatureC: number, relativeHumidityPct: number): number {
  return (relativeHumidityPct / 100) * enhancementFactor(pressurePa, temperatureC) * saturationVapourPressurePa(temperatureC);
}

/** Mole fraction of water vapour x_v = h f psv / p (CIPM-2007). */
export function moleFractionWaterVapour(pressurePa: number, temperatureC: number, relativeHumidityPct: number): number {
  return vapourPressurePa(pressurePa, temperatureC, relativeHumidityPct) / pressurePa;
}
