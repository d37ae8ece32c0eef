import { ROLES, type Role } from '@fuelwright/shared';

/** How each role is named on screen. */
export const ROLE_LABELS: Record<Role, string> = {
  racer: 'Racer',
  coach: 'Coach',
  shop: 'Shop',
  admin: 'Admin',
};

export const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));
