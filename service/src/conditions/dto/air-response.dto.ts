import { ApiProperty } from '@nestjs/swagger';
import type { AirResponse } from '@fuelwright/shared';

/** OpenAPI description of the answer of POST /api/conditions/air (the shape is AirResponse). */
export class AirResponseDto implements AirResponse {
  @ApiProperty({ example: 1.1993, description: 'Moist-air density by the CIPM-2007 formula (Picard et al., Metrologia 45 (2008) 149), kg/m³' })
  densityKgM3: number;

  @ApiProperty({ example: 1.1919, description: 'Partial density of the dry-air part (what carries the oxygen), kg/m³' })
  dryAirDensityKgM3: number;

  @ApiProperty({ example: 11.7, description: 'Partial pressure of water vapour, hPa' })
  vaporPressureHpa: number;

  @ApiProperty({ example: 23.4, description: 'Saturation vapour pressure over water at the air temperature (CIPM-2007), hPa' })
  saturationVaporPressureHpa: number;

  @ApiProperty({ example: 214, description: 'ISA altitude whose density equals today’s (ICAO Doc 7488 / ISO 2533), geopotential metres' })
  densityAltitudeM: number;

  @ApiProperty({ example: 97.9, description: '100 × density / reference density' })
  relativeAirDensityPct: number;

  @ApiProperty({ enum: ['isa-sea-level', 'baseline'], description: 'The reference used for relativeAirDensityPct' })
  reference: AirResponse['reference'];

  @ApiProperty({ example: 1.225, description: 'Density of the reference, kg/m³' })
  referenceDensityKgM3: number;

  @ApiProperty({ example: 0.985, description: 'SAE J1349 (JUN1990 equation) power correction factor: 1 at 25 °C and 99 kPa dry-air pressure' })
  powerCorrectionFactor: number;

  @ApiProperty({ example: 1013.25, description: 'Station pressure used (given, or computed from elevation and QNH), hPa' })
  stationPressureHpa: number;

  @ApiProperty({ type: [String], description: 'Plain notes where an input or result is outside the formulas’ ranges' })
  warnings: string[];
}
