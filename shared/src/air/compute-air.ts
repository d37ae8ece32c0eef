/**
 * `computeAir`: the body of the open route POST /api/conditions/air. Pure: no I/O, no Node APIs.
 *
 * Inputs are today's air temperature, relative humidity and either the station (absolute, not
 * sea-level-reduced) pressure or the site's elevation plus the sea-level pressure (QNH).
 * Outside the ranges the formulas are meant for it still answers, with plain warnings; input
 * that cannot describe real air (not a finite number, humidity below 0 or above 100 %, pressure
 * not above zero, temperature at or below absolute zero) throws an `AirInputError` naming the field.
 */
import { moistAirCipm2007, DEFAULT_CO2_MOLE_FRACTION } from './cipm2007.js';
import { ISA, densityAltitudeM, geopotentialFromGeometric, stationPressureFromQnh } from './isa.js';
import { j1349CorrectionFactor, j1349Warnings } from './j1349.js';

/** Reference for the relative air density: ISA sea level (1.225 kg/m3) or the racer's baseline day. */
export type AirReference = { kind: 'isa-sea-level' } | { kind: 'baseline'; densityKgM3: number };

interface AirRequestCommon {
  /** Air temperature, C. */
  temperatureC: number;
  /** Relative humidity against liquid water, 0..100 %. */
  relativeHumidityPct: number;
  /** Reference for `relativeAirDensityPct`; ISA sea level when left out. */
  reference?: AirReference;
  /** Mole fraction of CO2 (CIPM-2007); 0.0004 when left out. */
  co2MoleFraction?: number;
}

/** Today's air with the station pressure read from a barometer at the track. */
export interface AirRequestByStationPressure extends AirRequestCommon {
  /** Absolute pressure at the track (not reduced to sea level), hPa. */
  stationPressureHpa: number;
  altitudeM?: undefined;
  seaLevelPressureHpa?: undefined;
}

/** Today's air with the track elevation and the sea-level pressure (QNH) from a weather report. */
export interface AirRequestByAltitude extends AirRequestCommon {
  /** Track elevation above mean sea level, GEOMETRIC metres (as on a map or GPS). */
  altitudeM: number;
  /** Sea-level pressure as an altimeter setting (QNH), hPa. */
  seaLevelPressureHpa: number;
  stationPressureHpa?: undefined;
}

/** Body of POST /api/conditions/air. */
export type AirRequest = AirRequestByStationPressure | AirRequestByAltitude;

/** Response of POST /api/conditions/air. */
export interface AirResponse {
  /** Moist-air density, CIPM-2007, kg/m3. */
  densityKgM3: number;
  /** Partial density of the dry-air part (what carries the oxygen), kg/m3. */
  dryAirDensityKgM3: number;
  /** Partial pressure of water vapour, hPa. */
  vaporPressureHpa: number;
  /** Saturation vapour pressure at the air temperature, hPa. */
  saturationVaporPressureHpa: number;
  /** ISA altitude whose density equals today's, GEOPOTENTIAL metres. */
  densityAltitudeM: number;
  /** 100 * density / reference density. */
  relativeAirDensityPct: number;
  /** The reference used for `relativeAirDensityPct`. */
  reference: AirReference['kind'];
  referenceDensityKgM3: number;
  /** SAE J1349 (JUN1990 equation) power correction factor; 1 at 25 C and 99 kPa dry-air pressure. */
  powerCorrectionFactor: number;
  /** Station pressure used (given, or computed from altitude and QNH), hPa. */
  stationPressureHpa: number;
  /** Plain-language notes where an input or result is outside the formulas' ranges. */
  warnings: string[];
}

/** Thrown for input that cannot describe real air; `field` names the request field. */
export class AirInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(message);
    this.name = 'AirInputError';
    this.field = field;
  }
}

export function isAirInputError(e: unknown): e is AirInputError {
  return e instanceof AirInputError || (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'AirInputError');
}

/** The ranges outside which `computeAir` warns. */
export const AIR_VALID_RANGES = {
  temperatureC: { min: -20, max: 50 },
  stationPressureHpa: { min: 600, max: 1100 },
  relativeHumidityPct: { min: 0, max: 100 },
  altitudeM: { min: -500, max: 11000 },
  seaLevelPressureHpa: { min: 870, max: 1085 },
} as const;

/** ISA sea-level density, kg/m3 (ICAO Doc 7488 / ISO 2533). */
export const ISA_SEA_LEVEL_DENSITY = ISA.rho0;

function requireFinite(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new AirInputError(field, `${field} must be a finite number.`);
  }
  return value;
}

function outside(value: number, range: { min: number; max: number }): boolean {
  return value < range.min || value > range.max;
}

/** Compute today's air figures. See the module comment for the contract. */
export function computeAir(input: AirRequest): AirResponse {
  const warnings: string[] = [];
  const R = AIR_VALID_RANGES;

  const temperatureC = requireFinite('temperatureC', input.temperatureC);
  if (temperatureC <= -273.15) throw new AirInputError('temperatureC', 'temperatureC must be above absolute zero (-273.15 C).');
  const rh = requireFinite('relativeHumidityPct', input.relativeHumidityPct);
  if (rh < 0 || rh > 100) throw new AirInputError('relativeHumidityPct', 'relativeHumidityPct must be between 0 and 100.');
  const co2 = input.co2MoleFraction === undefined ? DEFAULT_CO2_MOLE_FRACTION : requireFinite('co2MoleFraction', input.co2MoleFraction);
  if (co2 < 0 || co2 > 0.01) throw new AirInputError('co2MoleFraction', 'co2MoleFraction must be between 0 and 0.01.');

  let stationPressureHpa: number;
  // JSON bodies may carry nulls or both forms; look at the fields without the union's narrowing.
  const raw = input as { stationPressureHpa?: unknown; altitudeM?: unknown; seaLevelPressureHpa?: unknown };
  const hasStation = raw.stationPressureHpa !== undefined && raw.stationPressureHpa !== null;
  const hasAltitude = raw.altitudeM !== undefined && raw.altitudeM !== null;
  const hasSeaLevel = raw.seaLevelPressureHpa !== undefined && raw.seaLevelPressureHpa !== null;
  if (hasStation) {
    stationPressureHpa = requireFinite('stationPressureHpa', raw.stationPressureHpa);
    if (stationPressureHpa <= 0) throw new AirInputError('stationPressureHpa', 'stationPressureHpa must be above 0.');
    if (hasAltitude || hasSeaLevel) {
      warnings.push('Station pressure was given, so the altitude and sea-level pressure were not used.');
    }
  } else if (hasAltitude) {
    const altitudeM = requireFinite('altitudeM', raw.altitudeM);
    if (altitudeM <= -ISA.earthRadiusM / 2) throw new AirInputError('altitudeM', 'altitudeM is not a height on Earth.');
    if (!hasSeaLevel) {
      throw new AirInputError('seaLevelPressureHpa', 'seaLevelPressureHpa is needed with altitudeM (or give stationPressureHpa).');
    }
    const qnhHpa = requireFinite('seaLevelPressureHpa', raw.seaLevelPressureHpa);
    if (qnhHpa <= 0) throw new AirInputError('seaLevelPressureHpa', 'seaLevelPressureHpa must be above 0.');
    if (outside(altitudeM, R.altitudeM)) {
      warnings.push(
        `The altitude ${altitudeM.toFixed(0)} m is outside ${R.altitudeM.min}..${R.altitudeM.max} m, where the standard-atmosphere pressure law used to find the station pressure holds; measure the station pressure instead.`,
      );
    }
    if (outside(qnhHpa, R.seaLevelPressureHpa)) {
      warnings.push(
        `The sea-level pressure ${qnhHpa.toFixed(1)} hPa is outside ${R.seaLevelPressureHpa.min}..${R.seaLevelPressureHpa.max} hPa, beyond the extremes ever recorded; check the figure and its unit.`,
      );
    }
    const stationPa = stationPressureFromQnh(qnhHpa * 100, geopotentialFromGeometric(altitudeM));
    if (!Number.isFinite(stationPa) || stationPa <= 0) {
      throw new AirInputError('altitudeM', 'altitudeM is too high for the standard-atmosphere pressure law at this sea-level pressure.');
    }
    stationPressureHpa = stationPa / 100;
  } else {
    throw new AirInputError('stationPressureHpa', 'Give stationPressureHpa, or altitudeM with seaLevelPressureHpa.');
  }

  let referenceDensity: number = ISA_SEA_LEVEL_DENSITY;
  const reference: AirReference = input.reference ?? { kind: 'isa-sea-level' };
  if (reference.kind === 'baseline') {
    referenceDensity = requireFinite('reference.densityKgM3', reference.densityKgM3);
    if (referenceDensity <= 0) throw new AirInputError('reference.densityKgM3', 'reference.densityKgM3 must be above 0.');
    if (referenceDensity < 0.5 || referenceDensity > 1.6) {
      warnings.push(`The baseline density ${referenceDensity.toFixed(3)} kg/m3 is unlike any air at a track; check the baseline day.`);
    }
  } else if ((reference as { kind: unknown }).kind !== 'isa-sea-level') {
    throw new AirInputError('reference.kind', "reference.kind must be 'isa-sea-level' or 'baseline'.");
  }

  if (outside(temperatureC, R.temperatureC)) {
    warnings.push(
      `The temperature ${temperatureC.toFixed(1)} C is outside ${R.temperatureC.min}..${R.temperatureC.max} C; the air-density formulas are extrapolated and less certain.`,
    );
  }
  if (outside(stationPressureHpa, R.stationPressureHpa)) {
    warnings.push(
      `The station pressure ${stationPressureHpa.toFixed(1)} hPa is outside ${R.stationPressureHpa.min}..${R.stationPressureHpa.max} hPa, the range of the CIPM-2007 density formula; check that it is the pressure at the track in hPa.`,
    );
  }

  const air = moistAirCipm2007(temperatureC, stationPressureHpa * 100, rh, co2);
  const densityAltitude = densityAltitudeM(air.densityKgM3);
  if (densityAltitude < ISA.lowerLimitM || densityAltitude > ISA.upperLimitM) {
    warnings.push(
      `The density altitude ${densityAltitude.toFixed(0)} m is outside the standard atmosphere's ${ISA.lowerLimitM}..${ISA.upperLimitM} m; it is extrapolated.`,
    );
  }
  const dryKPa = air.dryAirPressurePa / 1000;
  warnings.push(...j1349Warnings(dryKPa, temperatureC));

  return {
    densityKgM3: air.densityKgM3,
    dryAirDensityKgM3: air.dryAirDensityKgM3,
    vaporPressureHpa: air.vapourPressurePa / 100,
    saturationVaporPressureHpa: air.saturationVapourPressurePa / 100,
    densityAltitudeM: densityAltitude,
    relativeAirDensityPct: relativeAirDensityPct(air.densityKgM3, referenceDensity),
    reference: reference.kind,
    referenceDensityKgM3: referenceDensity,
    powerCorrectionFactor: j1349CorrectionFactor(dryKPa, temperatureC),
    stationPressureHpa,
    warnings,
  };
}

/** 100 * density / reference density. */
export function relativeAirDensityPct(densityKgM3: number, referenceDensityKgM3: number = ISA_SEA_LEVEL_DENSITY): number {
  return (100 * densityKgM3) / referenceDensityKgM3;
}

/**
 * Change in air density from a baseline day to today, in % of the baseline; positive means the air
 * is denser today (the mixture leans out), negative thinner (it richens). The diagnosis rules use
 * it as the fact `air-density-changed`.
 */
export function densityChangePct(baselineDensityKgM3: number, todayDensityKgM3: number): number {
  return (100 * (todayDensityKgM3 - baselineDensityKgM3)) / baselineDensityKgM3;
}
