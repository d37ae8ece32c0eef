import { Injectable, UnauthorizedException, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator.js';
import { SESSION_COOKIE, type AuthenticatedRequest } from '../session-user.js';
import { SessionService } from '../../auth/session.service.js';

/**
 * Global guard: resolves the session cookie to a user on every request, and refuses routes that
 * are not marked @Public() when there is none.
 */
@Injectable()
export class SessionGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly sessions: SessionService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const req = context.switchToHttp().getRequest<AuthenticatedRequest>();
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token === 'string' && token.length > 0) {
      req.user = (await this.sessions.resolve(token)) ?? undefined;
    }
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    if (!req.user) throw new UnauthorizedException('Sign in first.');
    return true;
  }
}
