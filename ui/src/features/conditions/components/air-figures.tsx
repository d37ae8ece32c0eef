import { Card } from '@blueprintjs/core';
import { formatDensity, formatLength, formatNumber, formatPercent, formatPressure, type AirResponse, type UnitPreferences } from '@fuelwright/shared';

function Figure({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <Card className="fw-figure" compact>
      <div className="fw-figure-label">{label}</div>
      <div className="fw-figure-value">{value}</div>
      {note && <div className="fw-figure-note fw-muted fw-small">{note}</div>}
    </Card>
  );
}

/** The air figures of one answer, in the viewer's units (densities always in kg/m³). */
export function AirFigures({
  air,
  units,
  showStationPressure,
  referenceText,
}: {
  air: AirResponse;
  units: UnitPreferences;
  showStationPressure: boolean;
  /** The reference in words ("Blue 27’s session of 12 Nov 2026 (ran right), 1.172 kg/m³"). */
  referenceText?: string;
}) {
  const reference = referenceText
    ? `against ${referenceText}`
    : air.reference === 'baseline'
      ? `against your day’s ${formatDensity(air.referenceDensityKgM3)}`
      : 'against ISA sea level, 1.225 kg/m³';
  return (
    <div className="fw-figures" aria-label="Air figures">
      <Figure label="Air density" value={formatDensity(air.densityKgM3)} note="Moist air, CIPM-2007" />
      <Figure label="Dry-air density" value={formatDensity(air.dryAirDensityKgM3)} note="The part that carries the oxygen" />
      <Figure label="Relative air density" value={formatPercent(air.relativeAirDensityPct)} note={reference} />
      <Figure label="Density altitude" value={formatLength(air.densityAltitudeM, units.length)} note="Standard-atmosphere height with this density" />
      <Figure
        label="Vapour pressure"
        value={formatPressure(air.vaporPressureHpa, units.pressure, { decimals: units.pressure === 'hPa' || units.pressure === 'mmHg' ? 1 : 3 })}
        note={`Saturation: ${formatPressure(air.saturationVaporPressureHpa, units.pressure, { decimals: units.pressure === 'hPa' || units.pressure === 'mmHg' ? 1 : 3 })}`}
      />
      <Figure label="Power correction factor" value={formatNumber(air.powerCorrectionFactor, 3)} note="SAE J1349 (JUN1990); 1 at 25 °C, 99 kPa dry" />
      {showStationPressure && <Figure label="Station pressure used" value={formatPressure(air.stationPressureHpa, units.pressure)} note="From elevation and sea-level pressure" />}
    </div>
  );
}
