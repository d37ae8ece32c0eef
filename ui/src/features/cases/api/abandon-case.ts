import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AbandonCaseRequest, CaseDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { caseQueryKey } from './get-case';
import { casesQueryKey } from './get-cases';

/** POST /api/cases/:id/abandon: answers with the case, now abandoned (409 when already finished). */
export function abandonCase(caseId: string, body: AbandonCaseRequest): Promise<CaseDto> {
  return api.post<CaseDto>(`/cases/${encodeURIComponent(caseId)}/abandon`, body);
}

export function useAbandonCase(caseId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AbandonCaseRequest) => abandonCase(caseId, body),
    onSuccess: (changed) => queryClient.setQueryData(caseQueryKey(caseId), changed),
    onSettled: () => queryClient.invalidateQueries({ queryKey: casesQueryKey }),
  });
}
