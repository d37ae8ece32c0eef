import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaseDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { casesQueryKey } from './get-cases';

/** GET /api/cases/:id: one case with its ranking, results and timeline (404 when not the viewer's). */
export function getCase(caseId: string, signal?: AbortSignal): Promise<CaseDto> {
  return api.get<CaseDto>(`/cases/${encodeURIComponent(caseId)}`, { signal });
}

export const caseQueryKey = (caseId: string) => [...casesQueryKey, 'detail', caseId] as const;

export function getCaseQueryOptions(caseId: string) {
  return queryOptions({ queryKey: caseQueryKey(caseId), queryFn: ({ signal }) => getCase(caseId, signal) });
}

export function useCase(caseId: string) {
  return useQuery(getCaseQueryOptions(caseId));
}
