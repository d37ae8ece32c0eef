import { SetMetadata } from '@nestjs/common';
import type { Role } from '@fuelwright/shared';

export const ROLES_KEY = 'roles';
/** Limits a route (or a controller) to these roles; without it any signed-in user may call it. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
