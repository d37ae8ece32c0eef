import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsNumber,
  IsObject,
  Max,
  Min,
  ValidateIf,
  ValidateNested,
  registerDecorator,
  type ValidationArguments,
} from 'class-validator';
import { JET_KIT_MAX_SIZES, SETUP_RANGES, type JetKit, type JetNumberScaling } from '@fuelwright/shared';

const given = (v: unknown) => v !== undefined && v !== null;

/** The property must be left out when `other` is given (a kit is a step or a list, not both). */
function NotWith(other: string, message: string) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'notWith',
      target: object.constructor,
      propertyName,
      validator: {
        validate: (value: unknown, args: ValidationArguments) => !(given(value) && given((args.object as Record<string, unknown>)[other])),
        defaultMessage: () => message,
      },
    });
}

const STEP = { min: 0.5, max: 25 } as const;
const finite = { allowNaN: false, allowInfinity: false } as const;

export class MainJetSizesDto {
  @ApiPropertyOptional({ example: 2.5, minimum: STEP.min, maximum: STEP.max, description: 'Every `step` from the baseline jet (or give sizes)' })
  @ValidateIf((o: MainJetSizesDto) => given(o.step) || !given(o.sizes))
  @IsNumber(finite, { message: 'main.step must be a number: the gap between neighbouring main jet sizes in your kit (often 2.5 or 5), or list the sizes instead' })
  @Min(STEP.min, { message: `main.step must be from ${STEP.min} to ${STEP.max}: the gap between neighbouring main jet sizes (often 2.5 or 5)` })
  @Max(STEP.max, { message: `main.step must be from ${STEP.min} to ${STEP.max}: the gap between neighbouring main jet sizes (often 2.5 or 5)` })
  step?: number;

  @ApiPropertyOptional({ type: [Number], example: [175, 177.5, 180, 182.5, 185], description: 'The main jet sizes you hold (or give step)' })
  @ValidateIf((o: MainJetSizesDto) => given(o.sizes))
  @NotWith('step', 'main: give either step or sizes, not both')
  @IsArray({ message: 'main.sizes must be a list of the main jet sizes you hold' })
  @ArrayMinSize(1, { message: 'main.sizes must list at least one size' })
  @ArrayMaxSize(JET_KIT_MAX_SIZES, { message: `main.sizes must list at most ${JET_KIT_MAX_SIZES} sizes` })
  @IsNumber(finite, { each: true, message: 'main.sizes must hold numbers: the sizes stamped on your main jets' })
  @Min(SETUP_RANGES.mainJet.min, { each: true, message: `main.sizes must each be from ${SETUP_RANGES.mainJet.min} to ${SETUP_RANGES.mainJet.max}: sizes stamped on main jets` })
  @Max(SETUP_RANGES.mainJet.max, { each: true, message: `main.sizes must each be from ${SETUP_RANGES.mainJet.min} to ${SETUP_RANGES.mainJet.max}: sizes stamped on main jets` })
  sizes?: number[];
}

export class PilotJetSizesDto {
  @ApiPropertyOptional({ example: 2.5, minimum: STEP.min, maximum: STEP.max, description: 'Every `step` from the baseline jet (or give sizes)' })
  @ValidateIf((o: PilotJetSizesDto) => given(o.step) || !given(o.sizes))
  @IsNumber(finite, { message: 'pilot.step must be a number: the gap between neighbouring pilot jet sizes in your kit (often 2.5), or list the sizes instead' })
  @Min(STEP.min, { message: `pilot.step must be from ${STEP.min} to ${STEP.max}: the gap between neighbouring pilot jet sizes (often 2.5)` })
  @Max(STEP.max, { message: `pilot.step must be from ${STEP.min} to ${STEP.max}: the gap between neighbouring pilot jet sizes (often 2.5)` })
  step?: number;

  @ApiPropertyOptional({ type: [Number], example: [35, 37.5, 40], description: 'The pilot jet sizes you hold (or give step)' })
  @ValidateIf((o: PilotJetSizesDto) => given(o.sizes))
  @NotWith('step', 'pilot: give either step or sizes, not both')
  @IsArray({ message: 'pilot.sizes must be a list of the pilot jet sizes you hold' })
  @ArrayMinSize(1, { message: 'pilot.sizes must list at least one size' })
  @ArrayMaxSize(JET_KIT_MAX_SIZES, { message: `pilot.sizes must list at most ${JET_KIT_MAX_SIZES} sizes` })
  @IsNumber(finite, { each: true, message: 'pilot.sizes must hold numbers: the sizes stamped on your pilot jets' })
  @Min(SETUP_RANGES.pilotJet.min, { each: true, message: `pilot.sizes must each be from ${SETUP_RANGES.pilotJet.min} to ${SETUP_RANGES.pilotJet.max}: sizes stamped on pilot jets` })
  @Max(SETUP_RANGES.pilotJet.max, { each: true, message: `pilot.sizes must each be from ${SETUP_RANGES.pilotJet.min} to ${SETUP_RANGES.pilotJet.max}: sizes stamped on pilot jets` })
  sizes?: number[];
}

export const JET_SCALINGS = ['diameter', 'flow'] as const;

/** PUT /api/karts/:id/jet-kit */
export class JetKitDto {
  @ApiProperty({ enum: JET_SCALINGS, description: 'diameter: the jet number follows the hole diameter; flow: it follows the fuel flow' })
  @IsIn(JET_SCALINGS, {
    message: 'scaling must be diameter (the number stamped on the jet follows its hole diameter) or flow (the number follows how much fuel it flows)',
  })
  scaling: JetNumberScaling;

  @ApiProperty({ type: MainJetSizesDto })
  @IsObject({ message: 'main must be { step } or { sizes }: the main jets your kit holds' })
  @ValidateNested()
  @Type(() => MainJetSizesDto)
  main: MainJetSizesDto;

  @ApiProperty({ type: PilotJetSizesDto })
  @IsObject({ message: 'pilot must be { step } or { sizes }: the pilot jets your kit holds' })
  @ValidateNested()
  @Type(() => PilotJetSizesDto)
  pilot: PilotJetSizesDto;
}

/** A validated DTO as the plain kit that is stored: a step, or the sizes sorted without repeats. */
export function toJetKit(dto: JetKitDto): JetKit {
  const set = (s: MainJetSizesDto | PilotJetSizesDto) =>
    given(s.sizes) ? { sizes: [...new Set(s.sizes!)].sort((a, b) => a - b) } : { step: s.step! };
  return { scaling: dto.scaling, main: set(dto.main), pilot: set(dto.pilot) };
}
