import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ValidateIf, registerDecorator, type ValidationArguments } from 'class-validator';
import { SESSION_AIR_RANGES, type AirReading } from '@fuelwright/shared';
import { AIR_FIELD_WORDS } from '../../conditions/air-input.js';

const R = SESSION_AIR_RANGES;
type AirField = keyof typeof R;
const unit: Record<AirField, string> = { temperatureC: ' °C', stationPressureHpa: ' hPa', relativeHumidityPct: ' %', altitudeM: ' m', seaLevelPressureHpa: ' hPa' };
const rangeText = (f: AirField) => `${f} must be from ${R[f].min} to ${R[f].max}${unit[f]}: ${AIR_FIELD_WORDS[f]}`;
export const apply = (...decorators: PropertyDecorator[]): PropertyDecorator => (target, key) => decorators.forEach((d) => d(target, key));
const given = (v: unknown) => v !== undefined && v !== null;
const WHICH_PRESSURE =
  'Give the station pressure (a barometer at the track, hPa), or the track’s elevation with the sea-level pressure of a weather report';

/** A number in the field's range, with one message for each way it can be wrong. */
function airNumber(f: AirField, missing = `${f} is required: ${AIR_FIELD_WORDS[f]}`) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'airNumber',
      target: object.constructor,
      propertyName,
      validator: {
        validate: (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v >= R[f].min && v <= R[f].max,
        defaultMessage: (args?: ValidationArguments) => {
          const v = args?.value;
          if (!given(v)) return missing;
          if (typeof v !== 'number' || !Number.isFinite(v)) return `${f} must be a number: ${AIR_FIELD_WORDS[f]}`;
          return rangeText(f);
        },
      },
    });
}

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
  @airNumber('stationPressureHpa', `stationPressureHpa is required. ${WHICH_PRESSURE}.`)
  stationPressureHpa?: number;

  @ApiPropertyOptional({ example: 250, description: 'Track elevation, geometric metres (with seaLevelPressureHpa)' })
  @ValidateIf((o: AirReadingDto) => given(o.altitudeM) || (given(o.seaLevelPressureHpa) && !given(o.stationPressureHpa)))
  @airNumber('altitudeM', `altitudeM is required with seaLevelPressureHpa: ${AIR_FIELD_WORDS.altitudeM}`)
  altitudeM?: number;

  @ApiPropertyOptional({ example: 1016, description: 'Sea-level pressure (QNH), hPa (with altitudeM)' })
  @ValidateIf((o: AirReadingDto) => given(o.seaLevelPressureHpa) || (given(o.altitudeM) && !given(o.stationPressureHpa)))
  @airNumber('seaLevelPressureHpa', `seaLevelPressureHpa is required with altitudeM: ${AIR_FIELD_WORDS.seaLevelPressureHpa}. ${WHICH_PRESSURE}.`)
  seaLevelPressureHpa?: number;
}
