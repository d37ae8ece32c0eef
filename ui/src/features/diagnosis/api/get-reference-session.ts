import { useQuery } from '@tanstack/react-query';
import type { JettingSessionListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import type { ReferenceSession } from '../machines/conditions-draft';
import { kartsQueryKey } from './get-karts';

/**
 * GET /api/karts/:id/sessions, read for the walk-through: the kart's newest jetting-log session
 * that ran right (the reference day for today's air), or null when none did. The list comes
 * newest first.
 */
export async function getReferenceSession(kartId: string, signal?: AbortSignal): Promise<ReferenceSession | null> {
  const { sessions } = await api.get<JettingSessionListResponse>(`/karts/${encodeURIComponent(kartId)}/sessions`, { signal });
  const right = sessions.find((s) => s.ran === 'right');
  if (!right) return null;
  const { id, sessionOn, temperatureC, stationPressureHpa, relativeHumidityPct, densityKgM3 } = right;
  return { sessionId: id, sessionOn, temperatureC, stationPressureHpa, relativeHumidityPct, densityKgM3 };
}

/** Under the kart's `sessions` key, so logging or deleting a session refreshes it. */
export const referenceSessionQueryKey = (kartId: string) => [...kartsQueryKey, kartId, 'sessions', 'reference'] as const;

export function useReferenceSession(kartId: string | null) {
  return useQuery({
    queryKey: referenceSessionQueryKey(kartId ?? ''),
    queryFn: ({ signal }) => getReferenceSession(kartId!, signal),
    enabled: kartId !== null,
  });
}
