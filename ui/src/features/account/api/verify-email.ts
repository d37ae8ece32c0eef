import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TokenRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/auth/verify-email (open): confirms the address with the token from the e-mailed link (204). */
export async function verifyEmail(token: string): Promise<void> {
  await api.post<void>('/auth/verify-email', { token } satisfies TokenRequest);
}

export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyEmail,
    // The session's user now reads `emailVerified: true`.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
