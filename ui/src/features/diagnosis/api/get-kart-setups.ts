import { queryOptions } from '@tanstack/react-query';
import type { SetupDto, SetupListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { kartsQueryKey } from './get-karts';

/** GET /api/karts/:id/setups: the kart's setup snapshots, newest first. */
export async function getKartSetups(kartId: string, signal?: AbortSignal): Promise<SetupDto[]> {
  const { setups } = await api.get<SetupListResponse>(`/karts/${encodeURIComponent(kartId)}/setups`, { signal });
  return setups;
}

export const kartSetupsQueryKey = (kartId: string) => [...kartsQueryKey, kartId, 'setups'] as const;

/** Read by the walk-through's `loadKartSetup` actor (through the query cache) to fill the intake. */
export function getKartSetupsQueryOptions(kartId: string) {
  return queryOptions({ queryKey: kartSetupsQueryKey(kartId), queryFn: ({ signal }) => getKartSetups(kartId, signal) });
}
