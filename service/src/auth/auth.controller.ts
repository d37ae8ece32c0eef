import { Body, Controller, Get, HttpCode, Post, Res, UseGuards } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import { ApiCookieAuth, ApiOkResponse, ApiOperation, ApiTags, ApiTooManyRequestsResponse, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import { ConfigService } from '@nestjs/config';
import type { Response } from 'express';
import type { SessionResponse } from '@fuelwright/shared';
import type { AppConfig } from '../config/app.config.js';
import { Public } from '../common/decorators/public.decorator.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { SESSION_COOKIE, type SessionUser } from '../common/session-user.js';
import { SignInDto } from './dto/sign-in.dto.js';
import { SignUpDto } from './dto/sign-up.dto.js';
import { SignInCommand } from './commands/sign-in.command.js';
import { SignOutCommand } from './commands/sign-out.command.js';
import { SignUpCommand } from './commands/sign-up.command.js';
import { toUserDto } from './user-dto.js';
import { AccountTokensService } from './account-tokens.service.js';
import { PasswordResetRequestDto, ResetPasswordDto, TokenDto } from './dto/token.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  private readonly cookieSecure: boolean;

  constructor(
    private readonly commands: CommandBus,
    private readonly accountTokens: AccountTokensService,
    config: ConfigService,
  ) {
    this.cookieSecure = config.getOrThrow<AppConfig>('app').cookieSecure;
  }

  private setCookie(res: Response, token: string, expiresAt: Date): void {
    res.cookie(SESSION_COOKIE, token, {
      httpOnly: true,
      sameSite: 'lax',
      secure: this.cookieSecure,
      path: '/',
      expires: expiresAt,
    });
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('sign-up')
  @ApiOperation({ summary: 'Create a racer account and sign in' })
  @ApiTooManyRequestsResponse({ description: 'Rate-limited' })
  async signUp(@Body() dto: SignUpDto, @Res({ passthrough: true }) res: Response): Promise<SessionResponse> {
    const { user, token, expiresAt, shared } = await this.commands.execute(new SignUpCommand(dto.email, dto.password, dto.displayName, dto.invitationToken));
    this.setCookie(res, token, expiresAt);
    return shared ? { user, shared } : { user };
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('sign-in')
  @HttpCode(200)
  @ApiOperation({ summary: 'Sign in with e-mail and password; sets the session cookie' })
  @ApiUnauthorizedResponse({ description: 'E-mail or password is wrong (the same answer for both)' })
  async signIn(@Body() dto: SignInDto, @Res({ passthrough: true }) res: Response): Promise<SessionResponse> {
    const { user, token, expiresAt } = await this.commands.execute(new SignInCommand(dto.email, dto.password));
    this.setCookie(res, token, expiresAt);
    return { user };
  }

  @Public()
  @Post('sign-out')
  @HttpCode(204)
  @ApiOperation({ summary: 'End this session' })
  async signOut(@CurrentUser() user: SessionUser | undefined, @Res({ passthrough: true }) res: Response): Promise<void> {
    if (user) await this.commands.execute(new SignOutCommand(user.sessionId));
    res.clearCookie(SESSION_COOKIE, { path: '/', httpOnly: true, sameSite: 'lax', secure: this.cookieSecure });
  }

  @Get('me')
  @ApiCookieAuth(SESSION_COOKIE)
  @ApiOkResponse({ description: 'The signed-in user' })
  me(@CurrentUser() user: SessionUser): SessionResponse {
    return { user: toUserDto(user) };
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('verify-email')
  @HttpCode(204)
  @ApiOperation({ summary: 'Confirm an e-mail address with the token from the e-mailed link' })
  async verifyEmail(@Body() dto: TokenDto): Promise<void> {
    await this.accountTokens.verifyEmail(dto.token);
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('request-password-reset')
  @HttpCode(202)
  @ApiOperation({ summary: 'E-mail a reset link (the same answer whether or not the address has an account)' })
  async requestReset(@Body() dto: PasswordResetRequestDto): Promise<{ message: string }> {
    await this.accountTokens.requestReset(dto.email);
    return { message: 'If an account has this address, a reset link is on its way.' };
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('reset-password')
  @HttpCode(204)
  @ApiOperation({ summary: 'Set a new password with the token from the e-mailed link; signs out everywhere' })
  async resetPassword(@Body() dto: ResetPasswordDto): Promise<void> {
    await this.accountTokens.resetPassword(dto.token, dto.password);
  }
}
