import { Body, Controller, Get, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiBadRequestResponse, ApiBody, ApiOkResponse, ApiOperation, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { CatalogResponse, RankResponse } from '@fuelwright/shared';
import { Public } from '../common/decorators/public.decorator.js';
import { DiagnosisService } from './diagnosis.service.js';
import { CATALOG_SCHEMA, RANK_REQUEST_SCHEMA, RANK_RESPONSE_SCHEMA } from './openapi-schemas.js';

@ApiTags('diagnosis')
@Controller()
export class DiagnosisController {
  constructor(private readonly diagnosis: DiagnosisService) {}

  @Public()
  @Get('catalog')
  @ApiOperation({ summary: 'The current ruleset: symptoms, causes, checks (groups, minutes, steps, cautions), fixes' })
  @ApiOkResponse({ schema: CATALOG_SCHEMA })
  catalog(): CatalogResponse {
    return this.diagnosis.catalog();
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('diagnosis/rank')
  @HttpCode(200)
  @ApiOperation({
    summary: 'Rank likely causes and plan checks (stateless; nothing is saved)',
    description:
      'Symptoms, setup, conditions and check results in; ranked causes with reasons, the check plan, and a stop finding when one applies. Unknown ids answer 400 naming them; so does a foam-fitted or rebuild date in the future. Clients must ignore response fields they do not know. Rate-limited per client.',
  })
  @ApiBody({ schema: RANK_REQUEST_SCHEMA })
  @ApiOkResponse({ schema: RANK_RESPONSE_SCHEMA })
  @ApiBadRequestResponse({ description: 'A field is malformed or names an unknown symptom or check; `fields` names each' })
  @ApiTooManyRequestsResponse({ description: 'Rate-limited' })
  rank(@Body() body: unknown): Promise<RankResponse> {
    return this.diagnosis.rank(body);
  }
}
