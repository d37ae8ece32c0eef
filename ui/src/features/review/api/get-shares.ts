import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShareDto, ShareListResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

export interface SharesFilter {
  kartId?: string;
  caseId?: string;
}

/** GET /api/shares?kartId=&caseId= (owner): the owner's shares, revoked ones included and marked. */
export async function getShares(filter: SharesFilter, signal?: AbortSignal): Promise<ShareDto[]> {
  const params = new URLSearchParams();
  if (filter.kartId) params.set('kartId', filter.kartId);
  if (filter.caseId) params.set('caseId', filter.caseId);
  const query = params.toString();
  const { shares } = await api.get<ShareListResponse>(`/shares${query ? `?${query}` : ''}`, { signal });
  return shares;
}

export const sharesQueryKey = ['shares'] as const;

export function getSharesQueryOptions(filter: SharesFilter) {
  return queryOptions({
    queryKey: [...sharesQueryKey, filter] as const,
    queryFn: ({ signal }) => getShares(filter, signal),
  });
}

export function useShares(filter: SharesFilter, enabled = true) {
  return useQuery({ ...getSharesQueryOptions(filter), enabled });
}
