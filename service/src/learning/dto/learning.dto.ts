import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { CARBURETTOR_KINDS, type CarburettorKind, type CreateWorkOrderRequest, type LogOutcomeRequest, type StartProposalRequest } from '@fuelwright/shared';
import { CaseSetupDto } from '../../cases/dto/case.dto.js';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class LogOutcomeDto implements LogOutcomeRequest {
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'caseId must be the id of a case you can see' }) caseId?: string;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'workOrderId must be the id of one of your work orders' }) workOrderId?: string;

  @ApiProperty({ example: ['foam-degraded'] })
  @IsArray({ message: 'confirmedCauses must list what was really wrong: catalog cause ids, or something-else' })
  @ArrayMinSize(1, { message: 'confirmedCauses must name at least one cause (something-else when none fits)' })
  @ArrayMaxSize(5, { message: 'confirmedCauses must name at most 5 causes' })
  @IsString({ each: true, message: 'confirmedCauses must hold cause ids' })
  confirmedCauses: string[];

  @ApiPropertyOptional() @IsOptional() @Transform(trim) @IsString({ message: 'otherNote must be text' }) @MaxLength(1000, { message: 'otherNote must be at most 1000 characters' }) otherNote?: string;

  @ApiProperty()
  @Transform(trim)
  @IsString({ message: 'fix must be text' })
  @MinLength(1, { message: 'fix must say what fixed it' })
  @MaxLength(500, { message: 'fix must be at most 500 characters' })
  fix: string;

  @ApiPropertyOptional() @IsOptional() @Transform(trim) @IsString({ message: 'parts must be text' }) @MaxLength(500, { message: 'parts must be at most 500 characters' }) parts?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt({ message: 'labourMinutes must be a whole number of minutes' })
  @Min(0, { message: 'labourMinutes must not be negative' })
  @Max(6000, { message: 'labourMinutes must be at most 6000 (100 hours)' })
  labourMinutes?: number;

  @ApiPropertyOptional() @IsOptional() @IsBoolean({ message: 'stillFixed must be true or false' }) stillFixed?: boolean;
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'supersedesId must be the id of the outcome this entry corrects' }) supersedesId?: string;
}

/** A walk-in's setup: a case's setup fields plus the carburettor kind (there is no kart record). */
export class WorkOrderSetupDto extends CaseSetupDto {
  @ApiPropertyOptional({ enum: CARBURETTOR_KINDS })
  @IsOptional()
  @IsIn(CARBURETTOR_KINDS, { message: 'carburettorKind must be pump-around or float-valve' })
  carburettorKind?: CarburettorKind;
}

export class CreateWorkOrderDto implements CreateWorkOrderRequest {
  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'caseId must be the id of a case shared with you' }) caseId?: string;
  @ApiPropertyOptional() @IsOptional() @Transform(trim) @IsString({ message: 'customerName must be text' }) @MaxLength(120, { message: 'customerName must be at most 120 characters' }) customerName?: string;
  @ApiPropertyOptional() @IsOptional() @Transform(trim) @IsString({ message: 'kartDescription must be text' }) @MaxLength(200, { message: 'kartDescription must be at most 200 characters' }) kartDescription?: string;

  @ApiPropertyOptional({ type: [Object] })
  @IsOptional()
  @IsArray({ message: 'symptoms must be a list of symptom ids or { id, band, engine, where }' })
  @ArrayMaxSize(30, { message: 'symptoms must list at most 30 entries' })
  symptoms?: (string | { id: string })[];

  @ApiPropertyOptional({ type: WorkOrderSetupDto }) @IsOptional() @ValidateNested() @Type(() => WorkOrderSetupDto) setup?: WorkOrderSetupDto;
  @ApiPropertyOptional() @IsOptional() @IsString({ message: 'notes must be text' }) @MaxLength(2000, { message: 'notes must be at most 2000 characters' }) notes?: string;
}

export class StartProposalDto implements StartProposalRequest {
  @ApiProperty({ example: 200, description: 'How many outcomes’ worth of weight the current expert values keep' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'strength must be a number of outcomes' })
  @Min(1, { message: 'strength must be at least 1' })
  @Max(100000, { message: 'strength must be at most 100000' })
  strength: number;

  @ApiProperty({ example: '1.1.0' })
  @Matches(/^\d+\.\d+\.\d+$/, { message: 'version must look like 1.1.0' })
  version: string;

  @ApiPropertyOptional({ example: 0.2 })
  @IsOptional()
  @IsNumber({}, { message: 'holdOutFraction must be a number from 0.05 to 0.5' })
  @Min(0.05, { message: 'holdOutFraction must be a number from 0.05 to 0.5' })
  @Max(0.5, { message: 'holdOutFraction must be a number from 0.05 to 0.5' })
  holdOutFraction?: number;

  @ApiPropertyOptional() @IsOptional() @IsInt({ message: 'seed must be a whole number' }) seed?: number;
}

export class PeriodDto {
  @ApiPropertyOptional() @IsOptional() @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'from must be a date written YYYY-MM-DD' }) from?: string;
  @ApiPropertyOptional() @IsOptional() @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'to must be a date written YYYY-MM-DD' }) to?: string;
  @ApiPropertyOptional() @IsOptional() @IsString({ message: 'version must be a ruleset version' }) version?: string;
}

export class InsightTableDto extends PeriodDto {
  @ApiProperty({ enum: ['pairs', 'labour', 'wrong-way', 'calibration'] })
  @IsIn(['pairs', 'labour', 'wrong-way', 'calibration'], { message: 'table must be pairs, labour, wrong-way or calibration' })
  table: 'pairs' | 'labour' | 'wrong-way' | 'calibration';
}

export class PublishDto {
  @ApiPropertyOptional() @IsOptional() @IsString({ message: 'notes must be text' }) @MaxLength(1000, { message: 'notes must be at most 1000 characters' }) notes?: string;
}
