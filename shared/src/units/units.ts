/**
 * Units the racer may prefer, and conversion to and from the units the API and the air
 * computations use: degrees Celsius, hectopascals, metres, kilograms per cubic metre.
 *
 * Factors (exact by definition):
 * - 1 ft = 0.3048 m (international yard and pound agreement, 1959).
 * - 1 conventional millimetre of mercury = 13.5951 g/cm3 * 1 mm * 9.80665 m/s2 = 133.322387415 Pa
 *   (NIST SP 811, appendix B).
 * - 1 conventional inch of mercury = 25.4 conventional mmHg = 3386.388640341 Pa = 33.86388640341 hPa
 *   (the "inch of mercury, conventional" of NIST SP 811, printed there rounded as 3.386389 kPa;
 *   altimeter settings in inHg use it, 29.92 inHg = 1013.2 hPa).
 * - F = C * 9/5 + 32.
 */

export const TEMPERATURE_UNITS = ['C', 'F'] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

export const PRESSURE_UNITS = ['hPa', 'kPa', 'inHg', 'mmHg'] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];

export const LENGTH_UNITS = ['m', 'ft'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

/** A user's unit preferences (stored per user; the API always speaks C, hPa, m). */
export interface UnitPreferences {
  temperature: TemperatureUnit;
  pressure: PressureUnit;
  length: LengthUnit;
}

export const DEFAULT_UNIT_PREFERENCES: Readonly<UnitPreferences> = Object.freeze({
  temperature: 'C',
  pressure: 'hPa',
  length: 'm',
});

/** hPa per conventional millimetre of mercury. */
export const HPA_PER_MMHG = 1.33322387415;
/** hPa per conventional inch of mercury (25.4 conventional mmHg). */
export const HPA_PER_INHG = 25.4 * HPA_PER_MMHG;
/** Metres per international foot. */
export const M_PER_FT = 0.3048;

const HPA_PER: Record<PressureUnit, number> = { hPa: 1, kPa: 10, inHg: HPA_PER_INHG, mmHg: HPA_PER_MMHG };

/** A temperature in `unit` to degrees Celsius. */
export function toCelsius(value: number, unit: TemperatureUnit): number {
  return unit === 'C' ? value : ((value - 32) * 5) / 9;
}

/** Degrees Celsius to `unit`. */
export function fromCelsius(celsius: number, unit: TemperatureUnit): number {
  return unit === 'C' ? celsius : (celsius * 9) / 5 + 32;
}

/** A pressure in `unit` to hPa. */
export function toHectopascals(value: number, unit: PressureUnit): number {
  return value * HPA_PER[unit];
}

/** hPa to `unit`. */
export function fromHectopascals(hpa: number, unit: PressureUnit): number {
  return unit === 'hPa' ? hpa : hpa / HPA_PER[unit];
}

/** A length in `unit` to metres. */
export function toMetres(value: number, unit: LengthUnit): number {
  return unit === 'm' ? value : value * M_PER_FT;
}

/** Metres to `unit`. */
export function fromMetres(metres: number, unit: LengthUnit): number {
  return unit === 'm' ? metres : metres / M_PER_FT;
}

/** Display symbols. */
export const UNIT_SYMBOLS: Readonly<Record<TemperatureUnit | PressureUnit | LengthUnit, string>> = Object.freeze({
  C: '°C',
  F: '°F',
  hPa: 'hPa',
  kPa: 'kPa',
  inHg: 'inHg',
  mmHg: 'mmHg',
  m: 'm',
  ft: 'ft',
});

/** Decimal places shown by default: about the resolution of the instruments racers use. */
export const DEFAULT_DECIMALS: Readonly<Record<TemperatureUnit | PressureUnit | LengthUnit, number>> = Object.freeze({
  C: 1,
  F: 1,
  hPa: 1,
  kPa: 2,
  inHg: 2,
  mmHg: 1,
  m: 0,
  ft: 0,
});

export interface FormatOptions {
  /** Decimal places; the unit's default when left out. */
  decimals?: number;
  /** Append the unit symbol (default true). */
  withUnit?: boolean;
}

/** Fixed decimals, '.' as separator, no "-0". Non-finite numbers show as an en dash. */
export function formatNumber(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '–';
  const s = value.toFixed(decimals);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

function withSymbol(text: string, symbol: string, options?: FormatOptions): string {
  if (text === '–' || options?.withUnit === false) return text;
  return `${text} ${symbol}`;
}

/** Format a temperature given in C in the preferred unit, e.g. "68.0 °F". */
export function formatTemperature(celsius: number, unit: TemperatureUnit, options?: FormatOptions): string {
  return withSymbol(formatNumber(fromCelsius(celsius, unit), options?.decimals ?? DEFAULT_DECIMALS[unit]), UNIT_SYMBOLS[unit], options);
}

/** Format a pressure given in hPa in the preferred unit, e.g. "29.92 inHg". */
export function formatPressure(hpa: number, unit: PressureUnit, options?: FormatOptions): string {
  return withSymbol(formatNumber(fromHectopascals(hpa, unit), options?.decimals ?? DEFAULT_DECIMALS[unit]), UNIT_SYMBOLS[unit], options);
}

/** Format a length given in m in the preferred unit, e.g. "1640 ft". */
export function formatLength(metres: number, unit: LengthUnit, options?: FormatOptions): string {
  return withSymbol(formatNumber(fromMetres(metres, unit), options?.decimals ?? DEFAULT_DECIMALS[unit]), UNIT_SYMBOLS[unit], options);
}

/** Format an air density, e.g. "1.184 kg/m³" (always SI: racers compare it across days). */
export function formatDensity(kgM3: number, options?: FormatOptions): string {
  return withSymbol(formatNumber(kgM3, options?.decimals ?? 3), 'kg/m³', options);
}

/** Format a percentage, e.g. "96.4 %". */
export function formatPercent(pct: number, options?: FormatOptions): string {
  return withSymbol(formatNumber(pct, options?.decimals ?? 1), '%', options);
}

/** Read user preferences leniently (e.g. from storage), falling back to the defaults field by field. */
export function normalizeUnitPreferences(value: unknown): UnitPreferences {
  const v = (typeof value === 'object' && value !== null ? value : {}) as Record<string, unknown>;
  const pick = <T extends string>(list: readonly T[], x: unknown, fallback: T): T =>
    typeof x === 'string' && (list as readonly string[]).includes(x) ? (x as T) : fallback;
  return {
    temperature: pick(TEMPERATURE_UNITS, v.temperature, DEFAULT_UNIT_PREFERENCES.temperature),
    pressure: pick(PRESSURE_UNITS, v.pressure, DEFAULT_UNIT_PREFERENCES.pressure),
    length: pick(LENGTH_UNITS, v.length, DEFAULT_UNIT_PREFERENCES.length),
  };
}
