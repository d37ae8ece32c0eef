import type { QueryClient } from '@tanstack/react-query';
import type { CaseDto, OpenCaseRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { caseQueryKey, casesQueryKey } from './get-case';

/** POST /api/cases: opens a case on one of the racer's karts (with results already done, if any). */
export function openCase(request: OpenCaseRequest, signal?: AbortSignal): Promise<CaseDto> {
  return api.post<CaseDto>('/cases', request, { signal });
}

/** After any change to a case: the case page shows the answer, the lists refetch. */
export function storeCase(queryClient: QueryClient, dto: CaseDto): void {
  queryClient.setQueryData(caseQueryKey(dto.id), dto);
  void queryClient.invalidateQueries({
    queryKey: casesQueryKey,
    predicate: (query) => query.queryKey[1] !== 'detail' || query.queryKey[2] !== dto.id,
  });
}
