import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SetupDto, SetupListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { kartQueryKey } from './get-kart';

/** GET /api/karts/:id/setups: the kart's setup snapshots, newest first, each with what changed. */
export async function getSetups(kartId: string, signal?: AbortSignal): Promise<SetupDto[]> {
  const { setups } = await api.get<SetupListResponse>(`/karts/${encodeURIComponent(kartId)}/setups`, { signal });
  return setups;
}

export const setupsQueryKey = (kartId: string) => [...kartQueryKey(kartId), 'setups'] as const;

export function getSetupsQueryOptions(kartId: string) {
  return queryOptions({ queryKey: setupsQueryKey(kartId), queryFn: ({ signal }) => getSetups(kartId, signal) });
}

export function useSetups(kartId: string) {
  return useQuery(getSetupsQueryOptions(kartId));
}
