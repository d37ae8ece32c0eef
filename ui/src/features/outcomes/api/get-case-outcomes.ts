import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaseOutcomeDto, CaseOutcomesResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { outcomesQueryKey } from './get-outcomes';

/**
 * GET /api/cases/:id/outcomes: every entry logged on a case (by its owner or a shop), newest
 * first, corrected ones with `current: false`. Anyone who may read the case; 404 for others.
 */
export function getCaseOutcomes(caseId: string, signal?: AbortSignal): Promise<CaseOutcomeDto[]> {
  return api.get<CaseOutcomesResponse>(`/cases/${encodeURIComponent(caseId)}/outcomes`, { signal }).then((r) => r.outcomes);
}

/** Under the outcome lists' key, so logging an outcome refetches it too. */
export const caseOutcomesQueryKey = (caseId: string) => [...outcomesQueryKey, 'case', caseId] as const;

export function getCaseOutcomesQueryOptions(caseId: string) {
  return queryOptions({ queryKey: caseOutcomesQueryKey(caseId), queryFn: ({ signal }) => getCaseOutcomes(caseId, signal) });
}

export function useCaseOutcomes(caseId: string, enabled = true) {
  return useQuery({ ...getCaseOutcomesQueryOptions(caseId), enabled });
}
