import { useMutation } from '@tanstack/react-query';
import type { PasswordResetRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/**
 * POST /api/auth/request-password-reset (open): always 202, whether or not the address has an
 * account, so the form tells nobody which addresses are registered.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  await api.post<{ message: string }>('/auth/request-password-reset', { email } satisfies PasswordResetRequest);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
