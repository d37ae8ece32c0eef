import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { DISPLAY_NAME_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, type SignUpRequest } from '@fuelwright/shared';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class SignUpDto implements SignUpRequest {
  @ApiProperty({ example: 'new.racer@example.test' })
  @Transform(trim)
  @IsEmail({}, { message: 'email must be an e-mail address, like name@example.org' })
  @MaxLength(254, { message: 'email must be at most 254 characters' })
  email: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  @IsString({ message: 'password must be text' })
  @MinLength(PASSWORD_MIN_LENGTH, { message: `password must be at least ${PASSWORD_MIN_LENGTH} characters` })
  @MaxLength(PASSWORD_MAX_LENGTH, { message: `password must be at most ${PASSWORD_MAX_LENGTH} characters` })
  password: string;

  @ApiProperty({ example: 'Sam', maxLength: DISPLAY_NAME_MAX_LENGTH })
  @Transform(trim)
  @IsString({ message: 'displayName must be text' })
  @MinLength(1, { message: 'displayName must not be empty: the name coaches and shops will see' })
  @MaxLength(DISPLAY_NAME_MAX_LENGTH, { message: `displayName must be at most ${DISPLAY_NAME_MAX_LENGTH} characters` })
  displayName: string;

  @ApiPropertyOptional({ description: 'The token from an invitation e-mail' })
  @IsOptional()
  @IsString({ message: 'invitationToken must be the token from the invitation e-mail' })
  @MaxLength(200, { message: 'invitationToken must be the token from the invitation e-mail' })
  invitationToken?: string;
}
