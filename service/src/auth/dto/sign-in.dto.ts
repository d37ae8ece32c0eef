import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { PASSWORD_MAX_LENGTH, type SignInRequest } from '@fuelwright/shared';

export class SignInDto implements SignInRequest {
  @ApiProperty({ example: 'racer@fuelwright.test' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'email must be text' })
  @IsNotEmpty({ message: 'email must not be empty' })
  @MaxLength(254, { message: 'email must be at most 254 characters' })
  email: string;

  @ApiProperty()
  @IsString({ message: 'password must be text' })
  @IsNotEmpty({ message: 'password must not be empty' })
  @MaxLength(PASSWORD_MAX_LENGTH, { message: `password must be at most ${PASSWORD_MAX_LENGTH} characters` })
  password: string;
}
