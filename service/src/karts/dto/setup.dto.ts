import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { IDLE_SCREW_STATES, SETUP_RANGES, type IdleScrewState, type SetupInput } from '@fuelwright/shared';
import { IsPastOrTodayDate } from '../../common/validators/calendar-date.js';

const R = SETUP_RANGES;
const range = (field: keyof typeof R, what: string) => [
  Min(R[field].min, { message: `${field} must be from ${R[field].min} to ${R[field].max}: ${what}` }),
  Max(R[field].max, { message: `${field} must be from ${R[field].min} to ${R[field].max}: ${what}` }),
];
const apply = (...decorators: PropertyDecorator[]): PropertyDecorator => (target, key) => decorators.forEach((d) => d(target, key));
const num = (field: string) => IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${field} must be a number` });

export class RecordSetupDto implements SetupInput {
  @ApiProperty({ example: '2026-11-28', description: 'The day the kart ran with this setup (YYYY-MM-DD, not in the future)' })
  @IsPastOrTodayDate('the day the kart ran with this setup')
  takenOn: string;

  @ApiPropertyOptional({ minimum: R.mainJet.min, maximum: R.mainJet.max })
  @IsOptional()
  @num('mainJet')
  @apply(...range('mainJet', 'the size stamped on the main jet (the big jet in the middle of the float bowl)'))
  mainJet?: number;

  @ApiPropertyOptional({ minimum: R.pilotJet.min, maximum: R.pilotJet.max })
  @IsOptional()
  @num('pilotJet')
  @apply(...range('pilotJet', 'the size stamped on the pilot (slow) jet, the small jet beside the main jet'))
  pilotJet?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: 7 })
  @IsOptional()
  @IsInt({ message: 'needleClipGroove must be a whole groove number, counted from the top of the needle (1 = top)' })
  @apply(...range('needleClipGroove', 'the groove the clip sits in, counted from the top of the needle'))
  needleClipGroove?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: 6 })
  @IsOptional()
  @num('airScrewTurnsOut')
  @apply(...range('airScrewTurnsOut', 'turns out from lightly seated, usually counted in quarter turns'))
  airScrewTurnsOut?: number;

  @ApiPropertyOptional({ enum: IDLE_SCREW_STATES })
  @IsOptional()
  @IsIn(IDLE_SCREW_STATES, { message: 'idleScrew must be backed-off (no idle: the slide closes fully) or set (the screw holds the slide open for an idle)' })
  idleScrew?: IdleScrewState;

  @ApiPropertyOptional({ minimum: R.idleScrewTurns.min, maximum: R.idleScrewTurns.max })
  @IsOptional()
  @num('idleScrewTurns')
  @apply(...range('idleScrewTurns', 'turns in from where the idle screw just touches the slide'))
  idleScrewTurns?: number;

  @ApiPropertyOptional({ example: '2026-10-01' })
  @IsOptional()
  @IsPastOrTodayDate('the day new foam blocks went into the float bowl')
  foamFittedDate?: string;

  @ApiPropertyOptional({ example: '2026-06-15' })
  @IsOptional()
  @IsPastOrTodayDate('the day the carburettor was last rebuilt (gaskets, needle, clip)')
  lastRebuildDate?: string;

  @ApiPropertyOptional({ minimum: R.premixRatio.min, maximum: R.premixRatio.max })
  @IsOptional()
  @num('premixRatio')
  @apply(...range('premixRatio', 'parts of fuel per part of two-stroke oil (write 32 for 32:1)'))
  premixRatio?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'ventLinesFitted must be true or false: are hoses fitted on the carburettor’s vent nipples?' })
  ventLinesFitted?: boolean;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'ventLinesRoutedUp must be true or false: do the vent hoses run upward?' })
  ventLinesRoutedUp?: boolean;

  @ApiPropertyOptional({ maxLength: 2000 })
  @IsOptional()
  @IsString({ message: 'note must be text' })
  @MaxLength(2000, { message: 'note must be at most 2000 characters' })
  note?: string;
}
