import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { periodQueryString, type PeriodFilter } from '../../../lib/period';
import type { InsightsResponse } from '@fuelwright/shared';

export type { RankingAccuracy, CalibrationBin, Calibration, SymptomCausePair, LabourByCause, WrongWayRule, Insights, InsightsResponse } from '@fuelwright/shared';

/** GET /api/insights?from&to&version (shop, admin): one pass over the period's current outcomes. */
export function getInsights(filter: PeriodFilter, signal?: AbortSignal): Promise<InsightsResponse> {
  return api.get<InsightsResponse>(`/insights${periodQueryString(filter)}`, { signal });
}

export const insightsQueryKey = ['insights'] as const;

export function getInsightsQueryOptions(filter: PeriodFilter = {}) {
  return queryOptions({
    queryKey: [...insightsQueryKey, filter] as const,
    queryFn: ({ signal }) => getInsights(filter, signal),
    // The previous figures stay on screen while a new filter loads.
    placeholderData: keepPreviousData,
  });
}

export function useInsights(filter: PeriodFilter = {}) {
  return useQuery(getInsightsQueryOptions(filter));
}
