import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChangeRoleRequest, Role, UserDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { getUsersQueryOptions } from './get-users';

export interface ChangeUserRoleInput {
  userId: string;
  role: Role;
}

/** PATCH /api/users/:id/role (admin): answers with the changed user. */
export async function changeUserRole({ userId, role }: ChangeUserRoleInput): Promise<UserDto> {
  const body: ChangeRoleRequest = { role };
  const { user } = await api.patch<{ user: UserDto }>(`/users/${encodeURIComponent(userId)}/role`, body);
  return user;
}

/** Changes a role; the user list is updated in place and refetched. */
export function useChangeUserRole() {
  const queryClient = useQueryClient();
  const { queryKey } = getUsersQueryOptions();
  return useMutation({
    mutationFn: changeUserRole,
    onSuccess: (changed) => {
      queryClient.setQueryData(queryKey, (users) => users?.map((user) => (user.id === changed.id ? changed : user)));
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey }),
  });
}
