import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RankResponse, SymptomReport } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/**
 * POST /api/diagnosis/rank with a work order's symptoms: the causes the ranking puts first, so the
 * outcome form can list them first. (The server ranks the walk-in itself when the outcome is logged.)
 */
export function rankSymptoms(symptoms: readonly SymptomReport[], signal?: AbortSignal): Promise<RankResponse> {
  return api.post<RankResponse>('/diagnosis/rank', { symptoms }, { signal });
}

export const rankSymptomsQueryKey = (symptoms: readonly SymptomReport[]) => ['rank-symptoms', symptoms] as const;

export function getRankSymptomsQueryOptions(symptoms: readonly SymptomReport[]) {
  return queryOptions({
    queryKey: rankSymptomsQueryKey(symptoms),
    queryFn: ({ signal }) => rankSymptoms(symptoms, signal),
    staleTime: 5 * 60_000,
    // Only a help for ordering: without it every cause is listed.
    retry: false,
  });
}

export function useRankSymptoms(symptoms: readonly SymptomReport[], enabled = true) {
  return useQuery({ ...getRankSymptomsQueryOptions(symptoms), enabled: enabled && symptoms.length > 0 });
}
