import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsNumber, IsObject, IsOptional, Max, Min, ValidateIf, ValidateNested } from 'class-validator';
import type { AirReference } from '@fuelwright/shared';
import { AIR_FIELD_WORDS } from '../air-input.js';

const num = (field: string) =>
  IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${field} must be a number: ${AIR_FIELD_WORDS[field]}` });

export const AIR_REFERENCE_KINDS = ['isa-sea-level', 'baseline'] as const;

export class AirReferenceDto {
  @ApiProperty({ enum: AIR_REFERENCE_KINDS, description: 'ISA sea level (1.225 kg/m³) or a baseline day of your own' })
  @IsIn(AIR_REFERENCE_KINDS, { message: `reference.kind must be ${AIR_FIELD_WORDS['reference.kind']}` })
  kind: AirReference['kind'];

  @ApiPropertyOptional({ example: 1.19, description: 'The baseline day’s air density, kg/m³ (with kind "baseline")' })
  @ValidateIf((o: AirReferenceDto) => o.kind === 'baseline')
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: `densityKgM3 must be a number: ${AIR_FIELD_WORDS['reference.densityKgM3']}` })
  densityKgM3?: number;
}

/**
 * Body of POST /api/conditions/air: temperature and humidity, and either the station pressure or
 * the track elevation with the sea-level pressure. Only what cannot be air is refused; values
 * outside the formulas' ranges are answered with warnings.
 */
export class AirRequestDto {
  @ApiProperty({ example: 20, description: 'Air temperature, °C' })
  @num('temperatureC')
  temperatureC: number;

  @ApiProperty({ example: 50, minimum: 0, maximum: 100, description: 'Relative humidity, % (against liquid water)' })
  @num('relativeHumidityPct')
  @Min(0, { message: `relativeHumidityPct must be from 0 to 100: ${AIR_FIELD_WORDS.relativeHumidityPct}` })
  @Max(100, { message: `relativeHumidityPct must be from 0 to 100: ${AIR_FIELD_WORDS.relativeHumidityPct}` })
  relativeHumidityPct: number;

  @ApiPropertyOptional({ example: 1013.25, description: 'Absolute pressure at the track, hPa. Give this, or altitudeM with seaLevelPressureHpa.' })
  @IsOptional()
  @num('stationPressureHpa')
  stationPressureHpa?: number;

  @ApiPropertyOptional({ example: 250, description: 'Track elevation above mean sea level, geometric metres (with seaLevelPressureHpa)' })
  @IsOptional()
  @num('altitudeM')
  altitudeM?: number;

  @ApiPropertyOptional({ example: 1018, description: 'Sea-level pressure as an altimeter setting (QNH), hPa (with altitudeM)' })
  @IsOptional()
  @num('seaLevelPressureHpa')
  seaLevelPressureHpa?: number;

  @ApiPropertyOptional({ type: AirReferenceDto, description: 'Reference for relativeAirDensityPct; ISA sea level when left out' })
  @IsOptional()
  @IsObject({ message: 'reference must be an object: { kind: "isa-sea-level" } or { kind: "baseline", densityKgM3 }' })
  @ValidateNested()
  @Type(() => AirReferenceDto)
  reference?: AirReferenceDto;

  @ApiPropertyOptional({ example: 0.0004, description: 'Mole fraction of CO2 (CIPM-2007); 0.0004 when left out' })
  @IsOptional()
  @num('co2MoleFraction')
  co2MoleFraction?: number;
}
