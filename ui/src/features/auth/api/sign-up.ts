import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionResponse, SignUpRequest, UserDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { replaceSession } from './get-me';

/** POST /api/auth/sign-up: creates a racer account, sets the session cookie, answers with the user. */
export async function signUp(request: SignUpRequest): Promise<UserDto> {
  const { user } = await api.post<SessionResponse>('/auth/sign-up', request);
  return user;
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (user) => replaceSession(queryClient, user),
  });
}
