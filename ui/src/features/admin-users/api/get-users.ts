import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserDto, UserListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/users (admin): every account. */
export async function getUsers(signal?: AbortSignal): Promise<UserDto[]> {
  const { users } = await api.get<UserListResponse>('/users', { signal });
  return users;
}

export const usersQueryKey = ['users'] as const;

export function getUsersQueryOptions() {
  return queryOptions({
    queryKey: usersQueryKey,
    queryFn: ({ signal }) => getUsers(signal),
  });
}

export function useUsers() {
  return useQuery(getUsersQueryOptions());
}
