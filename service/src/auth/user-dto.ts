import type { UserDto } from '@fuelwright/shared';

export function toUserDto(u: {
  id: string;
  email: string;
  displayName: string;
  role: UserDto['role'];
  createdAt: Date;
  emailVerifiedAt: Date | null;
}): UserDto {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    role: u.role,
    emailVerified: u.emailVerifiedAt !== null,
    createdAt: u.createdAt.toISOString(),
  };
}
