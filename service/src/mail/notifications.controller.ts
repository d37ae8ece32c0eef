import { BadRequestException, Body, Controller, Get, HttpCode, Post, Put } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional, ApiTags } from '@nestjs/swagger';
import { IsBoolean, IsOptional, IsString } from 'class-validator';
import type { NoticeSettings } from '@fuelwright/shared';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import type { SessionUser } from '../common/session-user.js';
import { MailService } from './mail.service.js';

const msg = (k: string) => ({ message: `${k} must be true (send) or false (do not send)` });

export class NoticeSettingsDto implements NoticeSettings {
  @ApiPropertyOptional() @IsOptional() @IsBoolean(msg('invitation')) invitation?: boolean;
  @ApiPropertyOptional() @IsOptional() @IsBoolean(msg('comment')) comment?: boolean;
  @ApiPropertyOptional({ name: 'check-recommended' }) @IsOptional() @IsBoolean(msg('check-recommended')) 'check-recommended'?: boolean;
  @ApiPropertyOptional({ name: 'photo-requested' }) @IsOptional() @IsBoolean(msg('photo-requested')) 'photo-requested'?: boolean;
  @ApiPropertyOptional({ name: 'photo-added' }) @IsOptional() @IsBoolean(msg('photo-added')) 'photo-added'?: boolean;
  @ApiPropertyOptional({ name: 'case-resolved' }) @IsOptional() @IsBoolean(msg('case-resolved')) 'case-resolved'?: boolean;
  @ApiPropertyOptional({ name: 'case-progress' }) @IsOptional() @IsBoolean(msg('case-progress')) 'case-progress'?: boolean;
}

export class UnsubscribeDto {
  @ApiProperty() @IsString({ message: 'token must be the token from the e-mail link' }) token: string;
}

@ApiTags('notifications')
@Controller()
export class NotificationsController {
  constructor(private readonly mail: MailService) {}

  @Get('me/notifications')
  async get(@CurrentUser() user: SessionUser): Promise<{ notices: NoticeSettings }> {
    return { notices: await this.mail.noticeSettings(user.id) };
  }

  @Put('me/notifications')
  async put(@CurrentUser() user: SessionUser, @Body() dto: NoticeSettingsDto): Promise<{ notices: NoticeSettings }> {
    return { notices: await this.mail.setNoticeSettings(user.id, { ...dto }) };
  }

  /** The link in every notice: turns that kind of notice off for that user, without signing in. */
  @Public()
  @Post('notifications/unsubscribe')
  @HttpCode(200)
  async unsubscribe(@Body() dto: UnsubscribeDto): Promise<{ kind: string }> {
    const t = this.mail.readUnsubscribeToken(dto.token);
    if (!t) throw new BadRequestException({ message: 'This unsubscribe link is not valid.', fields: { token: ['the link is damaged or not from Fuelwright'] } });
    await this.mail.setNoticeSettings(t.userId, { [t.kind]: false });
    return { kind: t.kind };
  }
}
