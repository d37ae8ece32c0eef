import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JetKitResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/karts/:id/jet-kit: how jet numbers scale and which sizes are held (a default until saved). */
export async function getJetKit(kartId: string, signal?: AbortSignal): Promise<JetKitResponse> {
  return api.get<JetKitResponse>(`/karts/${encodeURIComponent(kartId)}/jet-kit`, { signal });
}

export const jetKitQueryKey = (kartId: string) => ['karts', kartId, 'jet-kit'] as const;

export function getJetKitQueryOptions(kartId: string) {
  return queryOptions({ queryKey: jetKitQueryKey(kartId), queryFn: ({ signal }) => getJetKit(kartId, signal) });
}

export function useJetKit(kartId: string) {
  return useQuery(getJetKitQueryOptions(kartId));
}
