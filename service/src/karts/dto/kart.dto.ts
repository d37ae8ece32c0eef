import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min, MinLength } from 'class-validator';
import {
  CARBURETTOR_KINDS,
  DISPLACEMENT_RANGE_CC,
  DRIVES,
  KART_NAME_MAX_LENGTH,
  KART_NOTES_MAX_LENGTH,
  type CarburettorKind,
  type Drive,
  type KartInput,
} from '@fuelwright/shared';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class CreateKartDto implements KartInput {
  @ApiProperty({ example: 'Blue 27', maxLength: KART_NAME_MAX_LENGTH })
  @Transform(trim)
  @IsString({ message: 'name must be text' })
  @MinLength(1, { message: 'name must not be empty: a number or nickname you know the kart by' })
  @MaxLength(KART_NAME_MAX_LENGTH, { message: `name must be at most ${KART_NAME_MAX_LENGTH} characters` })
  name: string;

  @ApiProperty({ minimum: DISPLACEMENT_RANGE_CC.min, maximum: DISPLACEMENT_RANGE_CC.max, example: 125 })
  @IsInt({ message: 'displacementCc must be a whole number of cubic centimetres (cc), as stamped on the engine' })
  @Min(DISPLACEMENT_RANGE_CC.min, { message: `displacementCc must be at least ${DISPLACEMENT_RANGE_CC.min} cc` })
  @Max(DISPLACEMENT_RANGE_CC.max, { message: `displacementCc must be at most ${DISPLACEMENT_RANGE_CC.max} cc` })
  displacementCc: number;

  @ApiProperty({ enum: DRIVES })
  @IsIn(DRIVES, { message: 'drive must be gearbox (a shifter) or direct-drive (no gearbox, no clutch)' })
  drive: Drive;

  @ApiProperty({ enum: CARBURETTOR_KINDS })
  @IsIn(CARBURETTOR_KINDS, {
    message: 'carburettorKind must be pump-around (a pump feeds the bowl, a return tube sets the level) or float-valve (a float and needle valve set the level)',
  })
  carburettorKind: CarburettorKind;

  @ApiPropertyOptional({ maxLength: KART_NOTES_MAX_LENGTH })
  @IsOptional()
  @IsString({ message: 'notes must be text' })
  @MaxLength(KART_NOTES_MAX_LENGTH, { message: `notes must be at most ${KART_NOTES_MAX_LENGTH} characters` })
  notes?: string;
}

export class UpdateKartDto extends PartialType(CreateKartDto) {}
