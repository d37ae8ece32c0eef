import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsNumber, Max, Min, ValidateIf } from 'class-validator';
import { SESSION_AIR_RANGES, type AirReading } from '@fuelwright/shared';
import { AIR_FIELD_WORDS } from '../../conditions/air-input.js';

const R = SESSION_AIR_RANGES;
type AirField = keyof typeof R;
const unit: Record<AirField, string> = { temperatureC: ' °C', stationPressureHpa: ' hPa', relativeHumidityPct: ' %', altitudeM: ' m', seaLevelPressureHpa: ' hPa' };
const rangeText = (f: AirField) => `${f} must be from ${R[f].min} to ${R[f].max}${unit[f]}: ${AIR_FIELD_WORDS[f]}`;
export const apply = (...decorators: PropertyDecorator[]): PropertyDecorator => (target, key) => decorators.forEach((d) => d(target, key));
const airNumber = (f: AirField) =>
  apply(
    IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${f} must be a number: ${AIR_FIELD_WORDS[f]}` }),
    Min(R[f].min, { message: rangeText(f) }),
    Max(R[f].max, { message: rangeText(f) }),
  );

const given = (v: unknown) => v !== undefined && v !== null;
const WHICH_PRESSURE =
  'Give the station pressure (a barometer at the track, hPa), or the track’s elevation with the sea-level pressure of a weather report';

/** The day's air as read at the track: temperature, humidity, and a pressure in one of two ways. */
export class AirReadingDto implements AirReading {
  @ApiProperty({ example: 18, minimum: R.temperatureC.min, maximum: R.temperatureC.max, description: 'Air temperature, °C' })
  @airNumber('temperatureC')
  temperatureC: number;

  @ApiProperty({ example: 55, minimum: 0, maximum: 100, description: 'Relative humidity, %' })
  @airNumber('relativeHumidityPct')
  relativeHumidityPct: number;

  @ApiPropertyOptional({ example: 985, description: 'Absolute pressure at the track, hPa; or give altitudeM with seaLevelPressureHpa' })
  @ValidateIf((o: AirReadingDto) => given(o.stationPressureHpa) || !(given(o.altitudeM) || given(o.seaLevelPressureHpa)))
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: `stationPressureHpa must be a number. ${WHICH_PRESSURE}.` })
  @Min(R.stationPressureHpa.min, { message: rangeText('stationPressureHpa') })
  @Max(R.stationPressureHpa.max, { message: rangeText('stationPressureHpa') })
  stationPressureHpa?: number;

  @ApiPropertyOptional({ example: 250, description: 'Track elevation, geometric metres (with seaLevelPressureHpa)' })
  @ValidateIf((o: AirReadingDto) => given(o.altitudeM) || (given(o.seaLevelPressureHpa) && !given(o.stationPressureHpa)))
  @airNumber('altitudeM')
  altitudeM?: number;

  @ApiPropertyOptional({ example: 1016, description: 'Sea-level pressure (QNH), hPa (with altitudeM)' })
  @ValidateIf((o: AirReadingDto) => given(o.seaLevelPressureHpa) || (given(o.altitudeM) && !given(o.stationPressureHpa)))
  @airNumber('seaLevelPressureHpa')
  seaLevelPressureHpa?: number;
}
