import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsInt, IsNumber, IsOptional, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import {
  LAP_TIME_MS_RANGE,
  PLUG_COLOURS,
  RAN_VALUES,
  SESSION_NOTE_MAX_LENGTH,
  SETUP_RANGES,
  TRACK_NAME_MAX_LENGTH,
  type JettingSessionInput,
  type PlugColour,
  type Ran,
} from '@fuelwright/shared';
import { IsPastOrTodayDate } from '../../common/validators/calendar-date.js';
import { AirReadingDto, apply } from './air-reading.dto.js';

const S = SETUP_RANGES;
const range = (field: 'mainJet' | 'pilotJet' | 'needleClipGroove' | 'airScrewTurnsOut', what: string) =>
  apply(
    Min(S[field].min, { message: `${field} must be from ${S[field].min} to ${S[field].max}: ${what}` }),
    Max(S[field].max, { message: `${field} must be from ${S[field].min} to ${S[field].max}: ${what}` }),
  );
const num = (field: string, what: string) => IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${field} must be a number: ${what}` });
const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

const MAIN = 'the size stamped on the main jet it ran with';
const PILOT = 'the size stamped on the pilot (slow) jet it ran with';
const lap = `lapTimeMs must be a whole number of milliseconds from ${LAP_TIME_MS_RANGE.min} to ${LAP_TIME_MS_RANGE.max} (10 s to 10 min): the best lap of the session, e.g. 54321 for 54.321 s`;

/** POST /api/karts/:id/sessions: one session of the jetting log. */
export class LogSessionDto extends AirReadingDto implements JettingSessionInput {
  @ApiProperty({ example: '2026-11-28', description: 'The day of the session (YYYY-MM-DD, not in the future)' })
  @IsPastOrTodayDate('the day the kart ran this session')
  sessionOn: string;

  @ApiPropertyOptional({ maxLength: TRACK_NAME_MAX_LENGTH, example: 'Club circuit' })
  @IsOptional()
  @Transform(trim)
  @IsString({ message: 'track must be text: the name of the track' })
  @MaxLength(TRACK_NAME_MAX_LENGTH, { message: `track must be at most ${TRACK_NAME_MAX_LENGTH} characters` })
  track?: string;

  @ApiPropertyOptional({ description: 'A setup snapshot of this kart that it ran with' })
  @IsOptional()
  @IsUUID('all', { message: 'setupId must be the id of a setup snapshot of this kart' })
  setupId?: string;

  @ApiProperty({ minimum: S.mainJet.min, maximum: S.mainJet.max, example: 185 })
  @num('mainJet', MAIN)
  @range('mainJet', MAIN)
  mainJet: number;

  @ApiPropertyOptional({ minimum: S.pilotJet.min, maximum: S.pilotJet.max, example: 37.5 })
  @IsOptional()
  @num('pilotJet', PILOT)
  @range('pilotJet', PILOT)
  pilotJet?: number;

  @ApiPropertyOptional({ minimum: S.needleClipGroove.min, maximum: S.needleClipGroove.max })
  @IsOptional()
  @IsInt({ message: 'needleClipGroove must be a whole groove number, counted from the top of the needle (1 = top)' })
  @range('needleClipGroove', 'the groove the clip sits in, counted from the top of the needle')
  needleClipGroove?: number;

  @ApiPropertyOptional({ minimum: S.airScrewTurnsOut.min, maximum: S.airScrewTurnsOut.max })
  @IsOptional()
  @num('airScrewTurnsOut', 'turns out from lightly seated')
  @range('airScrewTurnsOut', 'turns out from lightly seated, usually counted in quarter turns')
  airScrewTurnsOut?: number;

  @ApiPropertyOptional({ enum: PLUG_COLOURS })
  @IsOptional()
  @IsIn(PLUG_COLOURS, {
    message: `plugColour must be one of ${PLUG_COLOURS.join(', ')}: the colour of the plug’s insulator nose after a clean cut at full throttle`,
  })
  plugColour?: PlugColour;

  @ApiProperty({ enum: RAN_VALUES })
  @IsIn(RAN_VALUES, {
    message: 'ran must be rich (boggy, smoky, wet plug), right (clean pull to the top, good plug) or lean (hot, flat at the top, pale plug)',
  })
  ran: Ran;

  @ApiPropertyOptional({ minimum: LAP_TIME_MS_RANGE.min, maximum: LAP_TIME_MS_RANGE.max, example: 54321 })
  @IsOptional()
  @IsInt({ message: lap })
  @Min(LAP_TIME_MS_RANGE.min, { message: lap })
  @Max(LAP_TIME_MS_RANGE.max, { message: lap })
  lapTimeMs?: number;

  @ApiPropertyOptional({ maxLength: SESSION_NOTE_MAX_LENGTH })
  @IsOptional()
  @IsString({ message: 'note must be text' })
  @MaxLength(SESSION_NOTE_MAX_LENGTH, { message: `note must be at most ${SESSION_NOTE_MAX_LENGTH} characters` })
  note?: string;
}
