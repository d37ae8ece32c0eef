import { hashKey, queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import type { SessionResponse, UserDto } from '@fuelwright/shared';
import { api, isApiError } from '../../../lib/api-client';

/** GET /api/auth/me: the signed-in user, or null when there is no session (401). */
export async function getMe(signal?: AbortSignal): Promise<UserDto | null> {
  try {
    const { user } = await api.get<SessionResponse>('/auth/me', { signal });
    return user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryKey = ['auth', 'me'] as const;

export function getMeQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

/** The session: `data` is the user, null for a visitor, undefined while the first check runs. */
export function useMe() {
  return useQuery(getMeQueryOptions());
}

/**
 * Replaces the session in the cache (a user after sign-in or sign-up, null after sign-out or an
 * expired session) and drops every other cached answer, so nothing of one account shows to another.
 */
export function replaceSession(queryClient: QueryClient, user: UserDto | null): void {
  const sessionHash = hashKey(meQueryKey);
  queryClient.removeQueries({ predicate: (query) => query.queryHash !== sessionHash });
  queryClient.setQueryData(meQueryKey, user);
}
