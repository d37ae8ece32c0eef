import { useQueries, useQuery } from '@tanstack/react-query';
import type { JettingSessionListResponse, KartListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { sortReferenceSessions, type ReferenceSession } from '../lib/air-reference';

/*
 * The signed-in racer's logged sessions, to pick one as the reference day: GET /api/karts, then
 * GET /api/karts/:id/sessions for each kart (a racer has a handful of karts). The query keys are
 * the jetting feature's, so a session logged or deleted there shows here without a reload.
 */

async function getKarts(signal?: AbortSignal) {
  const { karts } = await api.get<KartListResponse>('/karts', { signal });
  return karts;
}

async function getSessions(kartId: string, signal?: AbortSignal) {
  const { sessions } = await api.get<JettingSessionListResponse>(`/karts/${encodeURIComponent(kartId)}/sessions`, { signal });
  return sessions;
}

export type ReferenceSessionsState =
  | { status: 'off' }
  | { status: 'pending' }
  | { status: 'error'; message: string }
  | { status: 'ready'; sessions: ReferenceSession[] };

/** Every session of the user's karts, ran-right first, each group newest first; `off` for a visitor. */
export function useReferenceSessions(enabled: boolean): ReferenceSessionsState {
  const karts = useQuery({ queryKey: ['karts'] as const, queryFn: ({ signal }) => getKarts(signal), enabled });
  const kartList = karts.data ?? [];
  const perKart = useQueries({
    queries: kartList.map((kart) => ({
      queryKey: ['karts', kart.id, 'sessions'] as const,
      queryFn: ({ signal }: { signal: AbortSignal }) => getSessions(kart.id, signal),
      enabled,
    })),
  });
  if (!enabled) return { status: 'off' };
  if (karts.isError) return { status: 'error', message: karts.error.message };
  const failed = perKart.find((q) => q.isError);
  if (failed?.error) return { status: 'error', message: failed.error.message };
  if (karts.isPending || perKart.some((q) => q.isPending)) return { status: 'pending' };
  const sessions = kartList.flatMap((kart, i) => (perKart[i].data ?? []).map((s) => ({ ...s, kartName: kart.name })));
  return { status: 'ready', sessions: sortReferenceSessions(sessions) };
}
