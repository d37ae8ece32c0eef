import { useIsMutating, useMutation, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../../../lib/api-client';
import { replaceSession } from './get-me';

/** POST /api/auth/sign-out: ends the session (204). A 401 means it had already ended. */
export async function signOut(): Promise<void> {
  try {
    await api.post<void>('/auth/sign-out');
  } catch (error) {
    if (isApiError(error) && error.status === 401) return;
    throw error;
  }
}

export const signOutMutationKey = ['auth', 'sign-out'] as const;

/**
 * Signs out: this browser forgets the session and every cached answer, then `onSignedOut` runs
 * (typically: go to the landing page). While it runs the route guards hold the page instead of
 * sending the user to sign-in (see `useSigningOut`). If the server cannot be reached the session
 * is kept and the mutation fails.
 */
export function useSignOut({ onSignedOut }: { onSignedOut?: () => void | Promise<void> } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: signOutMutationKey,
    mutationFn: signOut,
    onSuccess: async () => {
      replaceSession(queryClient, null);
      await onSignedOut?.();
    },
  });
}

/** True while a sign-out is under way. */
export function useSigningOut(): boolean {
  return useIsMutating({ mutationKey: signOutMutationKey }) > 0;
}
