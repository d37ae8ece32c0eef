import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JettingSessionDto, JettingSessionListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/karts/:id/sessions: the jetting log, newest first. */
export async function getSessions(kartId: string, signal?: AbortSignal): Promise<JettingSessionDto[]> {
  const { sessions } = await api.get<JettingSessionListResponse>(`/karts/${encodeURIComponent(kartId)}/sessions`, { signal });
  return sessions;
}

export const sessionsQueryKey = (kartId: string) => ['karts', kartId, 'sessions'] as const;

export function getSessionsQueryOptions(kartId: string) {
  return queryOptions({ queryKey: sessionsQueryKey(kartId), queryFn: ({ signal }) => getSessions(kartId, signal) });
}

export function useSessions(kartId: string) {
  return useQuery(getSessionsQueryOptions(kartId));
}
