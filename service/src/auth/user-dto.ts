import type { UserDto } from '@fuelwright/shared';

export function toUserDto(u: { id: string; email: string; displayName: string; role: UserDto['role']; createdAt: Date }): UserDto {
  return { id: u.id, email: u.email, displayName: u.displayName, role: u.role, createdAt: u.createdAt.toISOString() };
}
