import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RankResponse, SetupSnapshot, SymptomReport } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** What a work order gives the ranking: the same two things the server ranks a walk-in with when its outcome is logged. */
export interface RankInput {
  symptoms: readonly SymptomReport[];
  setup: SetupSnapshot;
}

/**
 * POST /api/diagnosis/rank with a work order's symptoms and setup: the causes the ranking puts
 * first, so the outcome form can list them first. (The server ranks the walk-in itself when the
 * outcome is logged, with the same symptoms and setup.)
 */
export function rankSymptoms({ symptoms, setup }: RankInput, signal?: AbortSignal): Promise<RankResponse> {
  const hasSetup = Object.keys(setup).length > 0;
  return api.post<RankResponse>('/diagnosis/rank', hasSetup ? { symptoms, setup } : { symptoms }, { signal });
}

export const rankSymptomsQueryKey = ({ symptoms, setup }: RankInput) => ['rank-symptoms', symptoms, setup] as const;

export function getRankSymptomsQueryOptions(input: RankInput) {
  return queryOptions({
    queryKey: rankSymptomsQueryKey(input),
    queryFn: ({ signal }) => rankSymptoms(input, signal),
    staleTime: 5 * 60_000,
    // Only a help for ordering: without it every cause is listed.
    retry: false,
  });
}

export function useRankSymptoms(input: RankInput, enabled = true) {
  return useQuery({ ...getRankSymptomsQueryOptions(input), enabled: enabled && input.symptoms.length > 0 });
}
