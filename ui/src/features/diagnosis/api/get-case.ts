import { queryOptions } from '@tanstack/react-query';
import type { CaseDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** Every case query starts with this key: a change to a case refreshes the case lists and pages. */
export const casesQueryKey = ['cases'] as const;

export const caseQueryKey = (caseId: string) => [...casesQueryKey, 'detail', caseId] as const;

/** GET /api/cases/:id: the case with its ranking, results and timeline (404 when not the viewer's). */
export function getCase(caseId: string, signal?: AbortSignal): Promise<CaseDto> {
  return api.get<CaseDto>(`/cases/${encodeURIComponent(caseId)}`, { signal });
}

/** The walk-through always reads the case fresh (the server's case is the truth). */
export function getCaseQueryOptions(caseId: string) {
  return queryOptions({ queryKey: caseQueryKey(caseId), queryFn: ({ signal }) => getCase(caseId, signal), staleTime: 0 });
}
