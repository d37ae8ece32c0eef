import { FormGroup, SegmentedControl } from '@blueprintjs/core';
import {
  LENGTH_UNITS,
  PRESSURE_UNITS,
  TEMPERATURE_UNITS,
  UNIT_SYMBOLS,
  type LengthUnit,
  type PressureUnit,
  type TemperatureUnit,
  type UnitPreferences,
} from '@fuelwright/shared';

const options = (list: readonly string[]) => list.map((u) => ({ value: u, label: UNIT_SYMBOLS[u as keyof typeof UNIT_SYMBOLS] }));

/** Three segmented controls: temperature, pressure, length. Large buttons for gloved hands. */
export function UnitsControl({
  idPrefix,
  units,
  onChange,
  disabled,
}: {
  idPrefix: string;
  units: UnitPreferences;
  onChange: (units: UnitPreferences) => void;
  disabled?: boolean;
}) {
  return (
    <div id={idPrefix} className="fw-units-control" role="group" aria-label="Units">
      <FormGroup className="fw-units-group" label="Temperature">
        <SegmentedControl
          aria-label="Temperature unit"
          size="large"
          disabled={disabled}
          options={options(TEMPERATURE_UNITS)}
          value={units.temperature}
          onValueChange={(v) => onChange({ ...units, temperature: v as TemperatureUnit })}
        />
      </FormGroup>
      <FormGroup className="fw-units-group" label="Pressure">
        <SegmentedControl
          aria-label="Pressure unit"
          size="large"
          disabled={disabled}
          options={options(PRESSURE_UNITS)}
          value={units.pressure}
          onValueChange={(v) => onChange({ ...units, pressure: v as PressureUnit })}
        />
      </FormGroup>
      <FormGroup className="fw-units-group" label="Elevation">
        <SegmentedControl
          aria-label="Elevation unit"
          size="large"
          disabled={disabled}
          options={options(LENGTH_UNITS)}
          value={units.length}
          onValueChange={(v) => onChange({ ...units, length: v as LengthUnit })}
        />
      </FormGroup>
    </div>
  );
}
