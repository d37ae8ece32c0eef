import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, type PasswordResetRequest, type ResetPasswordRequest, type TokenRequest } from '@fuelwright/shared';

export class TokenDto implements TokenRequest {
  @ApiProperty()
  @IsString({ message: 'token must be the token from the e-mail link' })
  @MinLength(10, { message: 'token must be the token from the e-mail link' })
  @MaxLength(200, { message: 'token must be the token from the e-mail link' })
  token: string;
}

export class PasswordResetRequestDto implements PasswordResetRequest {
  @ApiProperty()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsEmail({}, { message: 'email must be an e-mail address, like name@example.org' })
  @MaxLength(254, { message: 'email must be at most 254 characters' })
  email: string;
}

export class ResetPasswordDto extends TokenDto implements ResetPasswordRequest {
  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH })
  @IsString({ message: 'password must be text' })
  @MinLength(PASSWORD_MIN_LENGTH, { message: `password must be at least ${PASSWORD_MIN_LENGTH} characters` })
  @MaxLength(PASSWORD_MAX_LENGTH, { message: `password must be at most ${PASSWORD_MAX_LENGTH} characters` })
  password: string;
}
