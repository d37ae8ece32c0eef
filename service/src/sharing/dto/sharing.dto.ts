import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateIf } from 'class-validator';
import { COMMENT_MAX_LENGTH, SHARE_SCOPES, type CreateShareRequest, type ShareScope } from '@fuelwright/shared';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class CreateShareDto implements CreateShareRequest {
  @ApiProperty({ enum: SHARE_SCOPES })
  @IsIn(SHARE_SCOPES, { message: 'scope must be kart (the kart and all its cases) or case (one case)' })
  scope: ShareScope;

  @ApiPropertyOptional()
  @ValidateIf((o: CreateShareDto) => o.scope === 'kart')
  @IsUUID('all', { message: 'kartId must be the id of one of your karts' })
  kartId?: string;

  @ApiPropertyOptional()
  @ValidateIf((o: CreateShareDto) => o.scope === 'case')
  @IsUUID('all', { message: 'caseId must be the id of one of your cases' })
  caseId?: string;

  @ApiProperty({ example: 'coach@example.test' })
  @Transform(trim)
  @IsEmail({}, { message: 'email must be the e-mail address of your coach or shop' })
  @MaxLength(254, { message: 'email must be at most 254 characters' })
  email: string;

  @ApiProperty({ enum: ['coach', 'shop'] })
  @IsIn(['coach', 'shop'], { message: 'as must be coach or shop: who the person is for you' })
  as: 'coach' | 'shop';
}

export class AcceptInvitationDto {
  @ApiProperty()
  @IsString({ message: 'token must be the token from the invitation e-mail' })
  @MinLength(10, { message: 'token must be the token from the invitation e-mail' })
  token: string;
}

export class CreateCommentDto {
  @ApiProperty({ maxLength: COMMENT_MAX_LENGTH })
  @Transform(trim)
  @IsString({ message: 'body must be text' })
  @MinLength(1, { message: 'body must not be empty' })
  @MaxLength(COMMENT_MAX_LENGTH, { message: `body must be at most ${COMMENT_MAX_LENGTH} characters` })
  body: string;
}

export class RecommendCheckDto {
  @ApiProperty({ example: 'foam-inspect' })
  @IsString({ message: 'checkId must be a check id from the catalog' })
  checkId: string;

  @ApiProperty({ maxLength: 500 })
  @Transform(trim)
  @IsString({ message: 'reason must be text' })
  @MinLength(1, { message: 'reason must not be empty: say why this check should come next' })
  @MaxLength(500, { message: 'reason must be at most 500 characters' })
  reason: string;
}

export class RequestPhotoDto {
  @ApiProperty({ example: 'The foam blocks, out of the bowl, in good light' })
  @Transform(trim)
  @IsString({ message: 'what must be text' })
  @MinLength(1, { message: 'what must say what the photo should show' })
  @MaxLength(300, { message: 'what must be at most 300 characters' })
  what: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'checkId must be a check id from the catalog' })
  checkId?: string;
}
