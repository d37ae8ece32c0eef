import { queryOptions, useQuery } from '@tanstack/react-query';
import type { KartDto, KartListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/karts: the racer's karts, to filter the case list by kart. */
export async function getKarts(signal?: AbortSignal): Promise<KartDto[]> {
  const { karts } = await api.get<KartListResponse>('/karts', { signal });
  return karts;
}

/** The same key (and data) as the karts screens use, so both share one cache entry. */
export const kartsQueryKey = ['karts'] as const;

export function getKartsQueryOptions() {
  return queryOptions({ queryKey: kartsQueryKey, queryFn: ({ signal }) => getKarts(signal) });
}

export function useKarts() {
  return useQuery(getKartsQueryOptions());
}
