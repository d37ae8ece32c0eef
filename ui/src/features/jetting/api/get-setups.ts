import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SetupDto, SetupListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { kartsQueryKey } from './get-karts';

/**
 * GET /api/karts/:id/setups: the kart's setup snapshots, newest first (to link a session to the
 * one it ran). Same key as the kart page's list, so recording a setup there refreshes this one.
 */
export async function getSetups(kartId: string, signal?: AbortSignal): Promise<SetupDto[]> {
  const { setups } = await api.get<SetupListResponse>(`/karts/${encodeURIComponent(kartId)}/setups`, { signal });
  return setups;
}

export const setupsQueryKey = (kartId: string) => [...kartsQueryKey, kartId, 'setups'] as const;

export function useSetups(kartId: string) {
  return useQuery(queryOptions({ queryKey: setupsQueryKey(kartId), queryFn: ({ signal }) => getSetups(kartId, signal) }));
}
