import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CaseDto, RecommendCheckRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { sharedCasesQueryKey } from './get-shared-cases';

export interface RecommendCheckInput extends RecommendCheckRequest {
  caseId: string;
}

/**
 * POST /api/cases/:id/recommendations (a shared coach or shop): the check then leads the racer's
 * plan with the reason. Answers with the whole case.
 */
export function recommendCheck({ caseId, checkId, reason }: RecommendCheckInput): Promise<CaseDto> {
  return api.post<CaseDto>(`/cases/${encodeURIComponent(caseId)}/recommendations`, { checkId, reason } satisfies RecommendCheckRequest);
}

/** `onCase` receives the changed case (the case page owns the case's cache). */
export function useRecommendCheck(caseId: string, onCase: (c: CaseDto) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: RecommendCheckRequest) => recommendCheck({ caseId, ...request }),
    onSuccess: onCase,
    onSettled: () => queryClient.invalidateQueries({ queryKey: sharedCasesQueryKey }),
  });
}
