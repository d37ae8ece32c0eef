/**
 * The intake's "Today's air and fuel", as typed: today's air, the air on the day the setup was last
 * right (typed, or a jetting-log session that ran right), and the days since the fuel was mixed.
 * Kept as text in the units it was typed in (so a reload or a change of units loses nothing), and
 * read into the `conditions` of the rank and open-case requests: each day's figures, its density
 * (CIPM-2007, the same `computeAir` as POST /api/conditions/air) when the day is complete, and the
 * change in density between the days.
 */
import {
  DEFAULT_UNIT_PREFERENCES,
  SESSION_AIR_RANGES,
  computeAir,
  densityChangePct,
  toCelsius,
  toHectopascals,
  toMetres,
  type AirFigures,
  type DiagnosisConditions,
  type UnitPreferences,
} from '@fuelwright/shared';
import { EMPTY_AIR_FORM, parseDecimal, type AirFormValues } from '../../../components/air-reading-fields';

/** A jetting-log session of the kart that ran right: the reference day a case can start from. */
export interface ReferenceSession {
  sessionId: string;
  sessionOn: string;
  temperatureC: number;
  stationPressureHpa: number;
  relativeHumidityPct: number;
  densityKgM3: number;
}

export interface ConditionsDraft {
  /** The units the air figures below were typed in. */
  units: UnitPreferences;
  today: AirFormValues;
  /** `log`: the kart's last session that ran right; `typed`: the figures in `reference`. */
  referenceFrom: 'log' | 'typed';
  reference: AirFormValues;
  /** Case mode: the kart's newest session that ran right, when it has one. */
  referenceSession: ReferenceSession | null;
  fuelAgeDays: string;
}

export function emptyConditionsDraft(): ConditionsDraft {
  return {
    units: { ...DEFAULT_UNIT_PREFERENCES },
    today: { ...EMPTY_AIR_FORM },
    referenceFrom: 'typed',
    reference: { ...EMPTY_AIR_FORM },
    referenceSession: null,
    fuelAgeDays: '',
  };
}

export type AirDay = 'today' | 'reference';

const DAY_NAMES: Record<AirDay, string> = { today: 'today', reference: 'on the day it ran right' };

/** The largest change in air density the ranking takes, percent (rules/src/request.ts). */
export const DENSITY_CHANGE_MAX_PCT = 50;

/** The longest fuel age the ranking takes, days (rules/src/request.ts). */
export const FUEL_AGE_MAX_DAYS = 3650;

export interface ConditionsParse {
  /** What goes into the request; undefined when nothing was entered. */
  conditions: DiagnosisConditions | undefined;
  /** Messages by request field (`conditions.today.relativeHumidityPct`, `conditions.fuelAgeDays`...). */
  errors: Record<string, string>;
  todayDensityKgM3: number | null;
  referenceDensityKgM3: number | null;
  /** Percent, positive = denser today; null until both days' densities are known. */
  densityChangePct: number | null;
}

interface DayParse {
  figures: AirFigures;
  errors: Record<string, string>;
}

function readDay(day: AirDay, values: AirFormValues, units: UnitPreferences): DayParse {
  const errors: Record<string, string> = {};
  const figures: AirFigures = {};
  const key = (field: string) => `conditions.${day}.${field}`;
  const when = DAY_NAMES[day];
  const read = (field: string, text: string, name: string, example: string): number | null => {
    if (text.trim() === '') return null;
    const n = parseDecimal(text);
    if (n === null) errors[key(field)] = `${name} ${when}: enter a number, for example ${example}.`;
    return n;
  };
  const inRange = (field: keyof typeof SESSION_AIR_RANGES, value: number, name: string, unit: string): boolean => {
    const { min, max } = SESSION_AIR_RANGES[field];
    if (value >= min && value <= max) return true;
    errors[key(field)] = `${name} ${when}: between ${min} and ${max} ${unit}.`;
    return false;
  };

  const t = read('temperatureC', values.temperature, 'Air temperature', units.temperature === 'C' ? '18' : '64');
  if (t !== null) {
    const c = toCelsius(t, units.temperature);
    if (inRange('temperatureC', c, 'Air temperature', '°C')) figures.temperatureC = c;
  }
  const h = read('relativeHumidityPct', values.humidity, 'Relative humidity', '60');
  if (h !== null && inRange('relativeHumidityPct', h, 'Relative humidity', '%')) figures.relativeHumidityPct = h;

  if (values.pressureMode === 'station') {
    const p = read('stationPressureHpa', values.stationPressure, 'Station pressure', units.pressure === 'hPa' ? '1005' : 'the barometer reading');
    if (p !== null) {
      const hpa = toHectopascals(p, units.pressure);
      if (inRange('stationPressureHpa', hpa, 'Station pressure', 'hPa')) figures.stationPressureHpa = hpa;
    }
  } else {
    const z = read('altitudeM', values.elevation, 'Track elevation', '250');
    const q = read('seaLevelPressureHpa', values.seaLevelPressure, 'Sea-level pressure', units.pressure === 'hPa' ? '1013' : 'the weather report figure');
    const zm = z === null ? null : toMetres(z, units.length);
    const qh = q === null ? null : toHectopascals(q, units.pressure);
    const zOk = zm !== null && inRange('altitudeM', zm, 'Track elevation', 'm');
    const qOk = qh !== null && inRange('seaLevelPressureHpa', qh, 'Sea-level pressure', 'hPa');
    if (z === null && q !== null && !errors[key('seaLevelPressureHpa')]) errors[key('altitudeM')] = `Track elevation ${when}: needed with the sea-level pressure.`;
    if (q === null && z !== null && !errors[key('altitudeM')]) errors[key('seaLevelPressureHpa')] = `Sea-level pressure ${when}: needed with the track elevation.`;
    if (zOk && qOk) {
      const station = computeAir({ temperatureC: 15, relativeHumidityPct: 0, altitudeM: zm, seaLevelPressureHpa: qh }).stationPressureHpa;
      if (inRange('stationPressureHpa', station, 'Station pressure worked out from the elevation', 'hPa')) figures.stationPressureHpa = station;
    }
  }

  const { temperatureC, relativeHumidityPct, stationPressureHpa } = figures;
  if (temperatureC !== undefined && relativeHumidityPct !== undefined && stationPressureHpa !== undefined) {
    figures.densityKgM3 = computeAir({ temperatureC, relativeHumidityPct, stationPressureHpa }).densityKgM3;
  }
  return { figures, errors };
}

function readFuelAge(text: string): { days?: number; error?: string } {
  if (text.trim() === '') return {};
  const n = parseDecimal(text);
  if (n === null || !Number.isInteger(n) || n < 0 || n > FUEL_AGE_MAX_DAYS) {
    return { error: `Days since the fuel was mixed: a whole number of days, 0 to ${FUEL_AGE_MAX_DAYS}.` };
  }
  return { days: n };
}

/** Reads the draft into the request's conditions, with one plain message per field that cannot be read. */
export function parseConditionsDraft(draft: ConditionsDraft): ConditionsParse {
  const today = readDay('today', draft.today, draft.units);
  const fromLog = draft.referenceFrom === 'log' && draft.referenceSession !== null;
  const reference: DayParse = fromLog
    ? (() => {
        const s = draft.referenceSession!;
        return {
          figures: { temperatureC: s.temperatureC, stationPressureHpa: s.stationPressureHpa, relativeHumidityPct: s.relativeHumidityPct, densityKgM3: s.densityKgM3 },
          errors: {},
        };
      })()
    : readDay('reference', draft.reference, draft.units);
  const fuel = readFuelAge(draft.fuelAgeDays);
  const errors: Record<string, string> = { ...today.errors, ...reference.errors };
  if (fuel.error) errors['conditions.fuelAgeDays'] = fuel.error;

  const todayDensity = today.figures.densityKgM3 ?? null;
  const referenceDensity = reference.figures.densityKgM3 ?? null;
  const change = todayDensity !== null && referenceDensity !== null ? densityChangePct(referenceDensity, todayDensity) : null;
  if (change !== null && Math.abs(change) > DENSITY_CHANGE_MAX_PCT) {
    errors['conditions.densityChangePct'] =
      `Change in air density: more than ${DENSITY_CHANGE_MAX_PCT} % between the two days; check both days' figures and their units.`;
  }

  const conditions: DiagnosisConditions = {};
  if (Object.keys(today.figures).length > 0) conditions.today = today.figures;
  // A reference day is only of use beside today's air.
  if (conditions.today && Object.keys(reference.figures).length > 0) conditions.reference = reference.figures;
  // Sent as worked out here, so the ranking uses the very figure the racer was shown.
  if (change !== null) conditions.densityChangePct = change;
  if (fuel.days !== undefined) conditions.fuelAgeDays = fuel.days;
  return {
    conditions: Object.keys(conditions).length > 0 ? conditions : undefined,
    errors,
    todayDensityKgM3: todayDensity,
    referenceDensityKgM3: referenceDensity,
    densityChangePct: change,
  };
}

/** Whether anything was typed (the section then starts open). */
export function conditionsDraftEntered(draft: ConditionsDraft): boolean {
  const typed = (v: AirFormValues) => [v.temperature, v.humidity, v.stationPressure, v.elevation, v.seaLevelPressure].some((t) => t.trim() !== '');
  return typed(draft.today) || typed(draft.reference) || draft.fuelAgeDays.trim() !== '';
}

// ---------------------------------------------------------------------------------------------
// An open case's conditions, back into a draft (correcting the case's facts)
// ---------------------------------------------------------------------------------------------

/** A figure as draft text: two decimals at most, so the round trip through the text stays within typing precision. */
const figureText = (value: number | undefined): string => (value === undefined ? '' : String(Math.round(value * 100) / 100));

function dayDraft(figures: AirFigures | undefined): AirFormValues {
  return {
    ...EMPTY_AIR_FORM,
    temperature: figureText(figures?.temperatureC),
    humidity: figureText(figures?.relativeHumidityPct),
    stationPressure: figureText(figures?.stationPressureHpa),
  };
}

/**
 * The conditions a case holds, as a draft in °C, hPa and m (the fields re-express it in the viewer's
 * units). The reference day is given as typed figures: the case keeps figures, not where they came from.
 */
export function draftFromConditions(conditions: DiagnosisConditions | null | undefined): ConditionsDraft {
  const draft = emptyConditionsDraft();
  if (!conditions) return draft;
  draft.today = dayDraft(conditions.today);
  draft.reference = dayDraft(conditions.reference);
  draft.fuelAgeDays = conditions.fuelAgeDays === undefined ? '' : String(conditions.fuelAgeDays);
  return draft;
}

/** How far a figure may move through the text and a change of units and still be "as it was". */
const FIGURE_TOLERANCE: Record<'temperatureC' | 'stationPressureHpa' | 'relativeHumidityPct', number> = {
  temperatureC: 0.05,
  stationPressureHpa: 0.05,
  relativeHumidityPct: 0.05,
};

function sameFigures(a: AirFigures | undefined, b: AirFigures | undefined): boolean {
  return (Object.keys(FIGURE_TOLERANCE) as (keyof typeof FIGURE_TOLERANCE)[]).every((field) => {
    const x = a?.[field];
    const y = b?.[field];
    return x === undefined || y === undefined ? x === y : Math.abs(x - y) <= FIGURE_TOLERANCE[field];
  });
}

/**
 * The conditions to send with a correction, or undefined when the draft still says what the case
 * holds (so correcting only the setup leaves the day's air exactly as recorded). A change in density
 * the case holds without both days' figures (given directly, or worked out by the server from the
 * kart's jetting log) is kept while neither day's figures change.
 */
export function correctedConditions(draft: ConditionsDraft, recorded: DiagnosisConditions | null | undefined): DiagnosisConditions | undefined {
  const was = recorded ?? {};
  const now = parseConditionsDraft(draft).conditions ?? {};
  const daysSame = sameFigures(now.today, was.today) && sameFigures(now.reference, was.reference);
  if (daysSame && now.fuelAgeDays === was.fuelAgeDays) return undefined;
  if (daysSame && now.densityChangePct === undefined && was.densityChangePct !== undefined) {
    return { ...now, densityChangePct: was.densityChangePct };
  }
  return now;
}

/**
 * The form's messages after the air section changed: a `conditions.*` message goes once its field
 * reads right, and one still wrong stays (with its current wording) until it is fixed; other
 * messages are kept as they are.
 */
export function conditionErrorsAfterEdit(formErrors: Record<string, string>, draft: ConditionsDraft): Record<string, string> {
  const still = parseConditionsDraft(draft).errors;
  return Object.fromEntries(
    Object.entries(formErrors)
      .filter(([key]) => !key.startsWith('conditions.') || key in still)
      .map(([key, message]) => [key, key.startsWith('conditions.') ? still[key] : message]),
  );
}
