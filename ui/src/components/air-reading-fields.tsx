import { useEffect, useRef } from 'react';
import { FormGroup, SegmentedControl } from '@blueprintjs/core';
import {
  UNIT_SYMBOLS,
  formatNumber,
  fromCelsius,
  fromHectopascals,
  fromMetres,
  toCelsius,
  toHectopascals,
  toMetres,
  DEFAULT_DECIMALS,
  type AirReading,
  type UnitPreferences,
} from '@fuelwright/shared';
import { TextField } from './text-field';
import './air-inputs.css';

/** How the pressure is given: a barometer at the track, or elevation plus a weather report's sea-level pressure. */
export type PressureMode = 'station' | 'elevation';

/** What the user typed, as text in their own units. */
export interface AirFormValues {
  temperature: string;
  humidity: string;
  pressureMode: PressureMode;
  stationPressure: string;
  elevation: string;
  seaLevelPressure: string;
}

export const EMPTY_AIR_FORM: AirFormValues = {
  temperature: '',
  humidity: '',
  pressureMode: 'station',
  stationPressure: '',
  elevation: '',
  seaLevelPressure: '',
};

/** The API fields each input feeds (400 messages come back under these names). */
export const AIR_API_FIELDS = ['temperatureC', 'relativeHumidityPct', 'stationPressureHpa', 'altitudeM', 'seaLevelPressureHpa'] as const;

/** A number typed with a point or a comma; null when it is not one. */
export function parseDecimal(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (t === '' || !/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return null;
  return Number(t);
}

export interface ParsedAir {
  reading: AirReading | null;
  /** Client-side messages by API field name. */
  errors: Record<string, string[]>;
}

/** Turns the typed values (user's units) into the API's reading (°C, hPa, m). */
export function parseAirForm(values: AirFormValues, units: UnitPreferences): ParsedAir {
  const errors: Record<string, string[]> = {};
  const need = (field: string, text: string, what: string): number | null => {
    const n = parseDecimal(text);
    if (n === null) errors[field] = [text.trim() === '' ? `Enter ${what}.` : `${what[0].toUpperCase()}${what.slice(1)} must be a number.`];
    return n;
  };
  const t = need('temperatureC', values.temperature, 'the air temperature');
  const h = need('relativeHumidityPct', values.humidity, 'the relative humidity');
  let pressure: Pick<AirReading, 'stationPressureHpa' | 'altitudeM' | 'seaLevelPressureHpa'> = {};
  if (values.pressureMode === 'station') {
    const p = need('stationPressureHpa', values.stationPressure, 'the station pressure');
    if (p !== null) pressure = { stationPressureHpa: toHectopascals(p, units.pressure) };
  } else {
    const z = need('altitudeM', values.elevation, 'the track elevation');
    const q = need('seaLevelPressureHpa', values.seaLevelPressure, 'the sea-level pressure');
    if (z !== null && q !== null) pressure = { altitudeM: toMetres(z, units.length), seaLevelPressureHpa: toHectopascals(q, units.pressure) };
  }
  if (Object.keys(errors).length > 0 || t === null || h === null) return { reading: null, errors };
  return { reading: { temperatureC: toCelsius(t, units.temperature), relativeHumidityPct: h, ...pressure }, errors };
}

/** Re-expresses typed values when the user switches units, so nothing typed changes meaning. */
export function convertAirForm(values: AirFormValues, from: UnitPreferences, to: UnitPreferences): AirFormValues {
  const conv = (text: string, toBase: (n: number) => number, fromBase: (n: number) => number, decimals: number) => {
    const n = parseDecimal(text);
    return n === null ? text : formatNumber(fromBase(toBase(n)), decimals + 1);
  };
  const next = { ...values };
  if (from.temperature !== to.temperature) {
    next.temperature = conv(values.temperature, (n) => toCelsius(n, from.temperature), (c) => fromCelsius(c, to.temperature), DEFAULT_DECIMALS[to.temperature]);
  }
  if (from.pressure !== to.pressure) {
    const p = (text: string) =>
      conv(text, (n) => toHectopascals(n, from.pressure), (hpa) => fromHectopascals(hpa, to.pressure), DEFAULT_DECIMALS[to.pressure]);
    next.stationPressure = p(values.stationPressure);
    next.seaLevelPressure = p(values.seaLevelPressure);
  }
  if (from.length !== to.length) {
    next.elevation = conv(values.elevation, (n) => toMetres(n, from.length), (m) => fromMetres(m, to.length), DEFAULT_DECIMALS[to.length]);
  }
  return next;
}

/** Converts the typed values whenever the user switches units, so nothing typed changes meaning. */
export function useConvertOnUnitChange(units: UnitPreferences, setValues: (f: (v: AirFormValues) => AirFormValues) => void): void {
  const previous = useRef(units);
  useEffect(() => {
    const from = previous.current;
    if (from.temperature !== units.temperature || from.pressure !== units.pressure || from.length !== units.length) {
      setValues((v) => convertAirForm(v, from, units));
    }
    previous.current = units;
  }, [units, setValues]);
}

/** The inputs for the day's air, in the user's units, with the API's messages under each. */
export function AirReadingFields({
  idPrefix,
  values,
  onChange,
  units,
  errors,
}: {
  idPrefix: string;
  values: AirFormValues;
  onChange: (values: AirFormValues) => void;
  units: UnitPreferences;
  errors: (apiField: string) => string[];
}) {
  const set = (patch: Partial<AirFormValues>) => onChange({ ...values, ...patch });
  const p = UNIT_SYMBOLS[units.pressure];
  return (
    <div className="fw-air-fields">
      <div className="fw-air-row">
        <TextField
          id={`${idPrefix}-temperature`}
          label={`Air temperature (${UNIT_SYMBOLS[units.temperature]})`}
          inputMode="decimal"
          autoComplete="off"
          value={values.temperature}
          onChange={(v) => set({ temperature: v })}
          errors={errors('temperatureC')}
          hint="In the shade, not on the tarmac."
        />
        <TextField
          id={`${idPrefix}-humidity`}
          label="Relative humidity (%)"
          inputMode="decimal"
          autoComplete="off"
          value={values.humidity}
          onChange={(v) => set({ humidity: v })}
          errors={errors('relativeHumidityPct')}
          hint="From a weather report or a hygrometer."
        />
      </div>
      <FormGroup label="Pressure from">
        <SegmentedControl
          aria-label="Pressure from"
          size="large"
          fill
          options={[
            { value: 'station', label: 'Barometer at the track' },
            { value: 'elevation', label: 'Elevation + weather report' },
          ]}
          value={values.pressureMode}
          onValueChange={(v) => set({ pressureMode: v as PressureMode })}
        />
      </FormGroup>
      {values.pressureMode === 'station' ? (
        <TextField
          id={`${idPrefix}-station-pressure`}
          label={`Station pressure (${p})`}
          inputMode="decimal"
          autoComplete="off"
          value={values.stationPressure}
          onChange={(v) => set({ stationPressure: v })}
          errors={errors('stationPressureHpa')}
          hint="The absolute pressure a barometer reads at the track, not the sea-level figure of a weather report."
        />
      ) : (
        <div className="fw-air-row">
          <TextField
            id={`${idPrefix}-elevation`}
            label={`Track elevation (${UNIT_SYMBOLS[units.length]})`}
            inputMode="decimal"
            autoComplete="off"
            value={values.elevation}
            onChange={(v) => set({ elevation: v })}
            errors={errors('altitudeM')}
            hint="Above sea level, as on a map."
          />
          <TextField
            id={`${idPrefix}-sea-level-pressure`}
            label={`Sea-level pressure (${p})`}
            inputMode="decimal"
            autoComplete="off"
            value={values.seaLevelPressure}
            onChange={(v) => set({ seaLevelPressure: v })}
            errors={errors('seaLevelPressureHpa')}
            hint="The QNH of a weather report."
          />
        </div>
      )}
    </div>
  );
}
