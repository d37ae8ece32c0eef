import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutcomeDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { periodQueryString, type PeriodFilter } from '../../../lib/period';

export interface OutcomeList {
  /** The newest entries (at most 200; the CSV export has them all). */
  outcomes: OutcomeDto[];
  /** Current entries in the period (corrected ones not counted). */
  total: number;
}

/** GET /api/outcomes?from&to&version (shop: its own entries; admin: everyone's). */
export function getOutcomes(filter: PeriodFilter, signal?: AbortSignal): Promise<OutcomeList> {
  return api.get<OutcomeList>(`/outcomes${periodQueryString(filter)}`, { signal });
}

/** Every outcome list (any filter) sits under this key; logging an outcome invalidates it. */
export const outcomesQueryKey = ['outcomes'] as const;

export function getOutcomesQueryOptions(filter: PeriodFilter = {}) {
  return queryOptions({
    queryKey: [...outcomesQueryKey, filter] as const,
    queryFn: ({ signal }) => getOutcomes(filter, signal),
  });
}

export function useOutcomes(filter: PeriodFilter = {}, enabled = true) {
  return useQuery({ ...getOutcomesQueryOptions(filter), enabled });
}
