import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ResetPasswordRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/auth/reset-password (open): sets the new password (204) and ends every session of the account. */
export async function resetPassword(request: ResetPasswordRequest): Promise<void> {
  await api.post<void>('/auth/reset-password', request);
}

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetPassword,
    // Any session of this account has ended: re-check it (and drop what it had loaded).
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
