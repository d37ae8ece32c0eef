import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SharedCaseSummaryDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/shared-cases (coach, shop): cases shared with the viewer, to open a work order on. */
export async function getSharedCases(signal?: AbortSignal): Promise<SharedCaseSummaryDto[]> {
  const { cases } = await api.get<{ cases: SharedCaseSummaryDto[] }>('/shared-cases', { signal });
  return cases;
}

export const sharedCasesQueryKey = ['shared-cases'] as const;

export function getSharedCasesQueryOptions() {
  return queryOptions({ queryKey: sharedCasesQueryKey, queryFn: ({ signal }) => getSharedCases(signal) });
}

export function useSharedCases(enabled = true) {
  return useQuery({ ...getSharedCasesQueryOptions(), enabled });
}
