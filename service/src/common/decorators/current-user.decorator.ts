import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { AuthenticatedRequest, SessionUser } from '../session-user.js';

/** The signed-in user of this request (set by the session guard). */
export const CurrentUser = createParamDecorator((_data: unknown, ctx: ExecutionContext): SessionUser | undefined => {
  return ctx.switchToHttp().getRequest<AuthenticatedRequest>().user;
});
