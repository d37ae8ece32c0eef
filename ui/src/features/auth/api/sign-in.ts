import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionResponse, SignInRequest, UserDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { replaceSession } from './get-me';

/** POST /api/auth/sign-in: sets the session cookie and answers with the user. */
export async function signIn(request: SignInRequest): Promise<UserDto> {
  const { user } = await api.post<SessionResponse>('/auth/sign-in', request);
  return user;
}

/** Signs in and stores the user as the session (the visitors-only guard then moves on). */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => replaceSession(queryClient, user),
  });
}
