import type { Request } from 'express';
import type { Role } from '@fuelwright/shared';

export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  createdAt: Date;
  emailVerifiedAt: Date | null;
  sessionId: string;
}

export interface AuthenticatedRequest extends Request {
  user?: SessionUser;
}

export const SESSION_COOKIE = 'fw_session';
