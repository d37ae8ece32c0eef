import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsUUID } from 'class-validator';
import { CASE_STATES, type CaseState } from '@fuelwright/shared';

export class ListCasesDto {
  @ApiPropertyOptional({ enum: CASE_STATES })
  @IsOptional()
  @IsIn(CASE_STATES, { message: `state must be one of: ${CASE_STATES.join(', ')}` })
  state?: CaseState;

  @ApiPropertyOptional()
  @IsOptional()
  @IsUUID('all', { message: 'kartId must be a kart id' })
  kartId?: string;
}
