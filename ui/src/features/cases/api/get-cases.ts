import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { CaseListResponse, CaseState, CaseSummaryDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

export interface CaseFilters {
  state?: CaseState;
  kartId?: string;
}

/** GET /api/cases?state=&kartId=: the racer's cases, filtered on the server. */
export async function getCases(filters: CaseFilters, signal?: AbortSignal): Promise<CaseSummaryDto[]> {
  const params = new URLSearchParams();
  if (filters.state) params.set('state', filters.state);
  if (filters.kartId) params.set('kartId', filters.kartId);
  const query = params.toString();
  const { cases } = await api.get<CaseListResponse>(`/cases${query ? `?${query}` : ''}`, { signal });
  return cases;
}

/** Every case query starts with this key: a change to a case refreshes lists and pages. */
export const casesQueryKey = ['cases'] as const;

export const caseListQueryKey = (filters: CaseFilters) =>
  [...casesQueryKey, 'list', { state: filters.state ?? null, kartId: filters.kartId ?? null }] as const;

export function getCasesQueryOptions(filters: CaseFilters) {
  return queryOptions({ queryKey: caseListQueryKey(filters), queryFn: ({ signal }) => getCases(filters, signal) });
}

export function useCases(filters: CaseFilters) {
  // Keep the rows on screen while another filter loads.
  return useQuery({ ...getCasesQueryOptions(filters), placeholderData: keepPreviousData });
}
