import { queryOptions, useQuery } from '@tanstack/react-query';
import type { KartDto, KartListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/karts: the signed-in racer's karts (to pick the kart a case is about). */
export async function getKarts(signal?: AbortSignal): Promise<KartDto[]> {
  const { karts } = await api.get<KartListResponse>('/karts', { signal });
  return karts;
}

export const kartsQueryKey = ['karts'] as const;

export function getKartsQueryOptions() {
  return queryOptions({ queryKey: kartsQueryKey, queryFn: ({ signal }) => getKarts(signal) });
}

export function useKarts(enabled = true) {
  return useQuery({ ...getKartsQueryOptions(), enabled });
}
