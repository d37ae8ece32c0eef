/**
 * The ICAO Standard Atmosphere (ICAO Doc 7488/3, 1993; identical to ISO 2533:1975) for the
 * troposphere (geopotential altitude -5 000..11 000 m) and the isothermal layer above it (to 20 000 m).
 *
 * ALTITUDES: every ISA function here takes and returns GEOPOTENTIAL altitude H (metres), as the
 * standard's tables do. A height above mean sea level from a map or GPS is GEOMETRIC (z); convert
 * with `geopotentialFromGeometric` (H = r z / (r + z), r = 6 356 766 m, the nominal Earth radius
 * of ISO 2533). At 2 000 m the two differ by 0.63 m.
 */

export const ISA = {
  /** Sea-level temperature, K. */
  T0: 288.15,
  /** Sea-level pressure, Pa. */
  p0: 101325,
  /** Sea-level density, kg/m3. */
  rho0: 1.225,
  /** Standard gravity, m/s2. */
  g0: 9.80665,
  /** Specific gas constant of dry air, J/(kg K) (R* / M = 8.31432 / 0.0289644). */
  R: 287.05287,
  /** Temperature lapse rate of the troposphere, K/m (temperature falls by this much per metre). */
  lapseRate: 0.0065,
  /** Top of the troposphere (tropopause), geopotential m. */
  tropopauseM: 11000,
  /** Top of the isothermal layer handled here, geopotential m. */
  upperLimitM: 20000,
  /** Lowest altitude in the standard's tables, geopotential m. */
  lowerLimitM: -5000,
  /** Nominal Earth radius for geopotential altitude, m. */
  earthRadiusM: 6356766,
} as const;

/** g0 / (L R): the exponent of the troposphere pressure law (5.255 877...). */
export const ISA_PRESSURE_EXPONENT = ISA.g0 / (ISA.lapseRate * ISA.R);

export interface IsaState {
  temperatureK: number;
  pressurePa: number;
  densityKgM3: number;
}

/** Geopotential altitude H from geometric altitude z (both in m). */
export function geopotentialFromGeometric(geometricM: number): number {
  return (ISA.earthRadiusM * geometricM) / (ISA.earthRadiusM + geometricM);
}

/** Geometric altitude z from geopotential altitude H (both in m). */
export function geometricFromGeopotential(geopotentialM: number): number {
  return (ISA.earthRadiusM * geopotentialM) / (ISA.earthRadiusM - geopotentialM);
}

const TROPOPAUSE_T = ISA.T0 - ISA.lapseRate * ISA.tropopauseM; // 216.65 K
const TROPOPAUSE_P = ISA.p0 * Math.pow(TROPOPAUSE_T / ISA.T0, ISA_PRESSURE_EXPONENT);
const TROPOPAUSE_RHO = TROPOPAUSE_P / (ISA.R * TROPOPAUSE_T);

/**
 * ISA temperature, pressure and density at a geopotential altitude (m). Valid from -5 000 to
 * 20 000 m; outside that the formulas are extrapolated (callers warn).
 */
export function isaAtGeopotential(geopotentialM: number): IsaState {
  if (geopotentialM <= ISA.tropopauseM) {
    const T = ISA.T0 - ISA.lapseRate * geopotentialM;
    const p = ISA.p0 * Math.pow(T / ISA.T0, ISA_PRESSURE_EXPONENT);
    return { temperatureK: T, pressurePa: p, densityKgM3: p / (ISA.R * T) };
  }
  const T = TROPOPAUSE_T;
  const p = TROPOPAUSE_P * Math.exp((-ISA.g0 * (geopotentialM - ISA.tropopauseM)) / (ISA.R * T));
  return { temperatureK: T, pressurePa: p, densityKgM3: p / (ISA.R * T) };
}

/**
 * Density altitude: the geopotential altitude (m) at which the ISA density equals `densityKgM3`.
 * Closed form in the troposphere, rho / rho0 = (T / T0)^(g0/(L R) - 1), so
 * H = (T0 / L) [1 - (rho / rho0)^(1 / (g0/(L R) - 1))]; in the isothermal layer
 * H = 11 000 + (R T11 / g0) ln(rho11 / rho).
 * The sea-level density used is p0 / (R T0) (= 1.2250 kg/m3) so that the function is the exact
 * inverse of `isaAtGeopotential`.
 */
export function densityAltitudeM(densityKgM3: number): number {
  if (densityKgM3 >= TROPOPAUSE_RHO) {
    const rho0 = ISA.p0 / (ISA.R * ISA.T0);
    return (ISA.T0 / ISA.lapseRate) * (1 - Math.pow(densityKgM3 / rho0, 1 / (ISA_PRESSURE_EXPONENT - 1)));
  }
  return ISA.tropopauseM + ((ISA.R * TROPOPAUSE_T) / ISA.g0) * Math.log(TROPOPAUSE_RHO / densityKgM3);
}

/**
 * Pressure altitude: the geopotential altitude (m) at which the ISA pressure equals `pressurePa`
 * (troposphere formula).
 */
export function pressureAltitudeM(pressurePa: number): number {
  return (ISA.T0 / ISA.lapseRate) * (1 - Math.pow(pressurePa / ISA.p0, 1 / ISA_PRESSURE_EXPONENT));
}

/**
 * Station pressure (Pa) from an altimeter setting QNH (Pa) and the station's geopotential elevation (m).
 *
 * Method: QNH is the altimeter sub-scale setting that makes an ISA-calibrated altimeter read the
 * station elevation when on the ground (the ICAO definition of QNH). Such an altimeter shows the difference
 * of ISA pressure altitudes, so H = Hp(p_station) - Hp(QNH), which gives
 *   p_station = p0 [ (QNH / p0)^n - L H / T0 ]^(1/n),  n = L R / g0 = 0.190 263.
 * (The same relation as the U.S. National Weather Service altimeter-setting equation, without
 * its 0.3 hPa instrument offset.) With QNH = 1013.25 hPa it returns the ISA pressure at H.
 * It is not the right inverse for a QFF or a "mean sea-level pressure" reduced with the actual
 * temperature; the two differ by a few hPa at high, hot or cold sites.
 * Returns NaN when no positive pressure satisfies the relation (elevation too high for the QNH).
 */
export function stationPressureFromQnh(qnhPa: number, geopotentialElevationM: number): number {
  const n = 1 / ISA_PRESSURE_EXPONENT;
  const base = Math.pow(qnhPa / ISA.p0, n) - (ISA.lapseRate * geopotentialElevationM) / ISA.T0;
  if (!(base > 0)) return Number.NaN;
  return ISA.p0 * Math.pow(base, 1 / n);
}

/** Inverse of `stationPressureFromQnh`: the QNH (Pa) for a station pressure and geopotential elevation. */
export function qnhFromStationPressure(stationPa: number, geopotentialElevationM: number): number {
  const n = 1 / ISA_PRESSURE_EXPONENT;
  return ISA.p0 * Math.pow(Math.pow(stationPa / ISA.p0, n) + (ISA.lapseRate * geopotentialElevationM) / ISA.T0, 1 / n);
}
