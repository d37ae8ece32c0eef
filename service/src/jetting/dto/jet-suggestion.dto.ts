import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';
import type { JetSuggestionInput } from '@fuelwright/shared';
import { AirReadingDto } from './air-reading.dto.js';

/** POST /api/karts/:id/jet-suggestion: today's air, and optionally the session to start from. */
export class JetSuggestionDto extends AirReadingDto implements JetSuggestionInput {
  @ApiPropertyOptional({ description: 'A session of this kart that ran right; the newest such session when left out' })
  @IsOptional()
  @IsUUID('all', { message: 'baselineSessionId must be the id of a session of this kart that ran right' })
  baselineSessionId?: string;
}
