import type { AirFigures, DiagnosisConditions } from '@fuelwright/shared';

export interface ConditionLine {
  label: string;
  value: string;
}

const round = (n: number, digits: number) => n.toLocaleString(undefined, { maximumFractionDigits: digits, minimumFractionDigits: 0 });

function airText(air: AirFigures): string | null {
  const parts: string[] = [];
  if (air.temperatureC !== undefined) parts.push(`${round(air.temperatureC, 1)} °C`);
  if (air.stationPressureHpa !== undefined) parts.push(`${round(air.stationPressureHpa, 1)} hPa at the track`);
  if (air.relativeHumidityPct !== undefined) parts.push(`${round(air.relativeHumidityPct, 0)}% humidity`);
  if (air.densityKgM3 !== undefined) parts.push(`air density ${round(air.densityKgM3, 3)} kg/m³`);
  return parts.length > 0 ? parts.join(', ') : null;
}

/**
 * The conditions of a case as lines of plain words. A positive density change means denser air
 * than on the reference day (colder, higher pressure or drier), which leans the mixture
 * (see DiagnosisConditions in shared/src/diagnosis.ts).
 */
export function conditionLines(conditions: DiagnosisConditions | null | undefined): ConditionLine[] {
  if (!conditions) return [];
  const lines: ConditionLine[] = [];
  const today = conditions.today ? airText(conditions.today) : null;
  if (today) lines.push({ label: 'Air that day', value: today });
  const reference = conditions.reference ? airText(conditions.reference) : null;
  if (reference) lines.push({ label: 'Air when the setup was last right', value: reference });
  if (conditions.densityChangePct !== undefined) {
    const pct = conditions.densityChangePct;
    const value =
      Math.abs(pct) < 0.05
        ? 'About the same air density as when the setup was last right'
        : pct > 0
          ? `${round(pct, 1)}% denser air than when the setup was last right (leans the mixture)`
          : `${round(-pct, 1)}% thinner air than when the setup was last right (richens the mixture)`;
    lines.push({ label: 'Air density change', value });
  }
  if (conditions.fuelAgeDays !== undefined) {
    lines.push({ label: 'Fuel age', value: conditions.fuelAgeDays === 1 ? 'Mixed 1 day before' : `Mixed ${round(conditions.fuelAgeDays, 0)} days before` });
  }
  return lines;
}
