import { Body, Controller, HttpCode, Post, UseGuards } from '@nestjs/common';
import { QueryBus } from '@nestjs/cqrs';
import { ApiBadRequestResponse, ApiOkResponse, ApiOperation, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { AirRequest, AirResponse } from '@fuelwright/shared';
import { Public } from '../common/decorators/public.decorator.js';
import { AirRequestDto } from './dto/air-request.dto.js';
import { AirResponseDto } from './dto/air-response.dto.js';
import { ComputeAirQuery } from './queries/compute-air.query.js';

@ApiTags('conditions')
@Controller('conditions')
export class ConditionsController {
  constructor(private readonly queries: QueryBus) {}

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('air')
  @HttpCode(200)
  @ApiOperation({
    summary: 'Today’s air: density, dry-air density, vapour pressure, density altitude, relative air density, power correction factor',
    description:
      'Open to visitors; nothing is stored. Give temperatureC and relativeHumidityPct, and either stationPressureHpa or altitudeM with seaLevelPressureHpa. ' +
      'Values outside the formulas’ ranges are still answered, with warnings. Formulas: CIPM-2007 moist-air density, ICAO/ISO standard atmosphere, SAE J1349 (JUN1990 equation).',
  })
  @ApiOkResponse({ type: AirResponseDto })
  @ApiBadRequestResponse({ description: 'Input that cannot describe real air; `fields` names the field' })
  @ApiTooManyRequestsResponse({ description: 'Rate-limited' })
  air(@Body() dto: AirRequestDto): Promise<AirResponse> {
    return this.queries.execute(new ComputeAirQuery(dto as AirRequest));
  }
}
