import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { generatePath, useNavigate, useSearchParams } from 'react-router-dom';
import type { SessionResponse, SignUpRequest, UserDto } from '@fuelwright/shared';
import { NEXT_PARAM, paths } from '../../../app/paths';
import { api } from '../../../lib/api-client';
import { replaceSession } from './get-me';

/** POST /api/auth/sign-up: creates a racer account, sets the session cookie, answers with the user (and what an invitation shared). */
export async function signUp(request: SignUpRequest): Promise<SessionResponse> {
  return api.post<SessionResponse>('/auth/sign-up', request);
}

/** The page to open after signing up through an invitation: the shared case, or the shared kart. */
export function sharedItemPath(shared: NonNullable<SessionResponse['shared']>): string {
  return shared.caseId ? generatePath(paths.case, { caseId: shared.caseId }) : generatePath(paths.kart, { kartId: shared.kartId });
}

export function useSignUp() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  // Through an invitation the shared item opens next. The sign-up page (for visitors) sends a
  // signed-in user on to its `next`, so `next` becomes the shared item first, and the session is set
  // only once the page shows that `next` (the router commits a navigation in a transition, later
  // than a session change would render).
  const [pending, setPending] = useState<{ user: UserDto; next: string } | null>(null);
  useEffect(() => {
    if (pending && searchParams.get(NEXT_PARAM) === pending.next) replaceSession(queryClient, pending.user);
  }, [pending, searchParams, queryClient]);
  return useMutation({
    mutationFn: signUp,
    onSuccess: ({ user, shared }: { user: UserDto; shared?: SessionResponse['shared'] }) => {
      if (!shared) return replaceSession(queryClient, user);
      const next = sharedItemPath(shared);
      setPending({ user, next });
      void navigate({ search: `?${NEXT_PARAM}=${encodeURIComponent(next)}` }, { replace: true });
    },
  });
}
