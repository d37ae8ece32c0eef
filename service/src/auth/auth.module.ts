import { Module } from '@nestjs/common';
import { AuthController } from './auth.controller.js';
import { SessionService } from './session.service.js';
import { TokenService } from './token.service.js';
import { AccountTokensService } from './account-tokens.service.js';
import { SignInHandler } from './commands/sign-in.handler.js';
import { SignOutHandler } from './commands/sign-out.handler.js';
import { SignUpHandler } from './commands/sign-up.handler.js';

const handlers = [SignUpHandler, SignInHandler, SignOutHandler];

@Module({
  controllers: [AuthController],
  providers: [SessionService, TokenService, AccountTokensService, ...handlers],
  exports: [SessionService, TokenService],
})
export class AuthModule {}
