import { queryOptions, useQuery } from '@tanstack/react-query';
import type { KartDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { kartsQueryKey } from './get-karts';

/** GET /api/karts/:id: one kart (404 when it is not the viewer's). */
export function getKart(kartId: string, signal?: AbortSignal): Promise<KartDto> {
  return api.get<KartDto>(`/karts/${encodeURIComponent(kartId)}`, { signal });
}

export const kartQueryKey = (kartId: string) => [...kartsQueryKey, kartId] as const;

export function getKartQueryOptions(kartId: string) {
  return queryOptions({ queryKey: kartQueryKey(kartId), queryFn: ({ signal }) => getKart(kartId, signal) });
}

export function useKart(kartId: string) {
  return useQuery(getKartQueryOptions(kartId));
}
