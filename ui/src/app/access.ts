import type { Role, UserDto } from '@fuelwright/shared';

/**
 * Who may open a route:
 * - `anyone`: visitors and signed-in users;
 * - `visitors`: only without a session (sign-in, sign-up, landing); signed-in users go on to their home;
 * - `signed-in`: any role;
 * - a list of roles: only those roles (others see the "not for your role" page).
 */
export type Access = 'anyone' | 'visitors' | 'signed-in' | readonly Role[];

export type AccessDecision = 'allow' | 'sign-in' | 'home' | 'forbidden';

export function decideAccess(access: Access, user: UserDto | null): AccessDecision {
  if (access === 'anyone') return 'allow';
  if (access === 'visitors') return user ? 'home' : 'allow';
  if (!user) return 'sign-in';
  if (access === 'signed-in') return 'allow';
  return access.includes(user.role) ? 'allow' : 'forbidden';
}

/** Whether a menu entry for a route with this access shows for this viewer. */
export function showsInMenu(access: Access, user: UserDto | null): boolean {
  return decideAccess(access, user) === 'allow';
}
