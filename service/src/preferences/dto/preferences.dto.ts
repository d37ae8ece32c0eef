import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsObject, ValidateNested } from 'class-validator';
import {
  LENGTH_UNITS,
  PRESSURE_UNITS,
  TEMPERATURE_UNITS,
  type LengthUnit,
  type PressureUnit,
  type TemperatureUnit,
  type UnitPreferences,
  type UserPreferences,
} from '@fuelwright/shared';

export class UnitPreferencesDto implements UnitPreferences {
  @ApiProperty({ enum: TEMPERATURE_UNITS })
  @IsIn(TEMPERATURE_UNITS, { message: 'units.temperature must be C (degrees Celsius) or F (degrees Fahrenheit)' })
  temperature: TemperatureUnit;

  @ApiProperty({ enum: PRESSURE_UNITS })
  @IsIn(PRESSURE_UNITS, {
    message: 'units.pressure must be hPa (hectopascals, the same as millibars), kPa, inHg (inches of mercury) or mmHg (millimetres of mercury)',
  })
  pressure: PressureUnit;

  @ApiProperty({ enum: LENGTH_UNITS })
  @IsIn(LENGTH_UNITS, { message: 'units.length must be m (metres) or ft (feet), for track elevation and density altitude' })
  length: LengthUnit;
}

/** PUT /api/me/preferences */
export class PreferencesDto implements UserPreferences {
  @ApiProperty({ type: UnitPreferencesDto })
  @IsObject({ message: 'units must be an object: { temperature, pressure, length }' })
  @ValidateNested()
  @Type(() => UnitPreferencesDto)
  units: UnitPreferencesDto;
}
