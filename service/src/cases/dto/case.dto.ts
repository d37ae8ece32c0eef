import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { plainToInstance, Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  MaxLength,
  MinLength,
  ValidateNested,
} from 'class-validator';
import {
  CARBURETTOR_KINDS,
  CASE_NOTE_MAX_LENGTH,
  CHECK_RESULT_VALUES,
  ENGINE_TEMPS,
  THROTTLE_BANDS,
  TRACK_POSITIONS,
  type CarburettorKind,
  type CheckResultValue,
  type DiagnosisConditions,
  type EngineTemp,
  type CorrectCaseFactsRequest,
  type OpenCaseRequest,
  type RecordCheckResultRequest,
  type ResolveCaseRequest,
  type SetupSnapshot,
  type SymptomReport,
  type ThrottleBand,
  type TrackPosition,
} from '@fuelwright/shared';
import { RecordSetupDto } from '../../karts/dto/setup.dto.js';
import { OmitType } from '@nestjs/swagger';

const oneOrMany = (values: readonly string[], field: string, what: string) =>
  IsIn(values, { each: true, message: `${field} must be ${values.join(', ')} (${what}), one value or a list` });

export class SymptomReportDto implements SymptomReport {
  @ApiProperty({ example: 'bog-on-acceleration' })
  @IsString({ message: 'id must be a symptom id from the catalog' })
  @MinLength(1, { message: 'id must be a symptom id from the catalog' })
  id: string;

  @ApiPropertyOptional({ enum: THROTTLE_BANDS, isArray: true })
  @IsOptional()
  @oneOrMany(THROTTLE_BANDS, 'band', 'how far the throttle is open when it shows')
  band?: ThrottleBand | ThrottleBand[];

  @ApiPropertyOptional({ enum: ENGINE_TEMPS, isArray: true })
  @IsOptional()
  @oneOrMany(ENGINE_TEMPS, 'engine', 'engine cold or warm when it shows')
  engine?: EngineTemp | EngineTemp[];

  @ApiPropertyOptional({ enum: TRACK_POSITIONS, isArray: true })
  @IsOptional()
  @oneOrMany(TRACK_POSITIONS, 'where', 'where on track it shows')
  where?: TrackPosition | TrackPosition[];
}

/** The setup at the time of a case: a setup snapshot's settings, no date needed. */
export class CaseSetupDto extends OmitType(RecordSetupDto, ['takenOn', 'note'] as const) implements SetupSnapshot {}

export class CaseConditionsDto implements DiagnosisConditions {
  @ApiPropertyOptional({ description: 'Air density today against the day the setup was last right, percent; positive = denser today' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'densityChangePct must be a number (percent; positive = denser air today)' })
  densityChangePct?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsObject({ message: 'today must be an object of air figures' })
  today?: DiagnosisConditions['today'];

  @ApiPropertyOptional()
  @IsOptional()
  @IsObject({ message: 'reference must be an object of air figures' })
  reference?: DiagnosisConditions['reference'];

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'fuelAgeDays must be a number of days since the fuel was mixed' })
  fuelAgeDays?: number;
}

export class PriorResultDto {
  @ApiProperty()
  @IsString({ message: 'checkId must be a check id from the catalog' })
  checkId: string;

  @ApiProperty({ enum: CHECK_RESULT_VALUES })
  @IsIn(CHECK_RESULT_VALUES, { message: `result must be one of: ${CHECK_RESULT_VALUES.join(', ')}` })
  result: CheckResultValue;

  @ApiPropertyOptional({ maxLength: CASE_NOTE_MAX_LENGTH })
  @IsOptional()
  @IsString({ message: 'note must be text' })
  @MaxLength(CASE_NOTE_MAX_LENGTH, { message: `note must be at most ${CASE_NOTE_MAX_LENGTH} characters` })
  note?: string;
}

/** A symptom may be sent as a bare id ("hesitation") or with where it shows ({ id, band, ... }). */
const SymptomList = () =>
  Transform(({ obj, key }) => {
    const raw = (obj as Record<string, unknown>)[key];
    if (!Array.isArray(raw)) return raw;
    return raw.map((v) => plainToInstance(SymptomReportDto, typeof v === 'string' ? { id: v } : v));
  });

export class OpenCaseDto implements OpenCaseRequest {
  @ApiProperty()
  @IsUUID('all', { message: 'kartId must be the id of one of your karts' })
  kartId: string;

  @ApiProperty({ type: [SymptomReportDto] })
  @IsArray({ message: 'symptoms must be a list of what you noticed' })
  @ArrayMaxSize(30, { message: 'symptoms must list at most 30 entries' })
  @ValidateNested({ each: true, message: 'symptoms must hold symptom ids or { id, band, engine, where } entries' })
  @SymptomList()
  symptoms: SymptomReportDto[];

  @ApiPropertyOptional({ type: CaseSetupDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => CaseSetupDto)
  setup?: CaseSetupDto;

  @ApiPropertyOptional({ type: CaseConditionsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => CaseConditionsDto)
  conditions?: CaseConditionsDto;

  @ApiPropertyOptional({ type: [PriorResultDto] })
  @IsOptional()
  @IsArray({ message: 'results must be a list of checks already done' })
  @ArrayMaxSize(100, { message: 'results must list at most 100 checks' })
  @ValidateNested({ each: true })
  @Type(() => PriorResultDto)
  results?: PriorResultDto[];
}

/** A corrected setup may carry the carburettor kind the case showed; the kart's own is kept whatever it says. */
export class CaseSetupCorrectionDto extends CaseSetupDto {
  @ApiPropertyOptional({ enum: CARBURETTOR_KINDS, description: 'Ignored: the kart’s own kind is kept' })
  @IsOptional()
  @IsIn(CARBURETTOR_KINDS, { message: `carburettorKind must be one of ${CARBURETTOR_KINDS.join(', ')}` })
  carburettorKind?: CarburettorKind;
}

export class CorrectCaseFactsDto implements CorrectCaseFactsRequest {
  @ApiPropertyOptional({ type: CaseSetupCorrectionDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => CaseSetupCorrectionDto)
  setup?: CaseSetupCorrectionDto;

  @ApiPropertyOptional({ type: CaseConditionsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => CaseConditionsDto)
  conditions?: CaseConditionsDto;
}

export class ReportSymptomsDto {
  @ApiProperty({ type: [SymptomReportDto] })
  @IsArray({ message: 'symptoms must be a list of what you noticed' })
  @ArrayMaxSize(30, { message: 'symptoms must list at most 30 entries' })
  @ValidateNested({ each: true, message: 'symptoms must hold symptom ids or { id, band, engine, where } entries' })
  @SymptomList()
  symptoms: SymptomReportDto[];
}

export class RecordCheckResultDto extends PriorResultDto implements RecordCheckResultRequest {}

export class ResolveCaseDto implements ResolveCaseRequest {
  @ApiProperty({ example: 'foam-degraded', description: 'A cause id from the catalog, or "something-else"' })
  @IsString({ message: 'causeId must be a cause id from the catalog, or something-else' })
  causeId: string;

  @ApiProperty({ example: 'Replaced the foam blocks' })
  @IsString({ message: 'fix must be text: what you did that fixed it' })
  @MinLength(1, { message: 'fix must not be empty: say what you did that fixed it' })
  @MaxLength(500, { message: 'fix must be at most 500 characters' })
  fix: string;

  @ApiPropertyOptional({ maxLength: CASE_NOTE_MAX_LENGTH })
  @IsOptional()
  @IsString({ message: 'note must be text' })
  @MaxLength(CASE_NOTE_MAX_LENGTH, { message: `note must be at most ${CASE_NOTE_MAX_LENGTH} characters` })
  note?: string;
}

export class AbandonCaseDto {
  @ApiPropertyOptional({ maxLength: CASE_NOTE_MAX_LENGTH })
  @IsOptional()
  @IsString({ message: 'reason must be text' })
  @MaxLength(CASE_NOTE_MAX_LENGTH, { message: `reason must be at most ${CASE_NOTE_MAX_LENGTH} characters` })
  reason?: string;
}

