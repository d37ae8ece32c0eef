import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LogOutcomeRequest, OutcomeDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { outcomesQueryKey } from './get-outcomes';
import { workOrdersQueryKey } from './get-work-orders';

/** Insight figures change with every outcome (the insights screen reads them under this key). */
const insightsQueryKey = ['insights'] as const;

/**
 * POST /api/outcomes: what really fixed it, on a case (its owner, or a shop it is shared with) or
 * on a shop's work order. Never edits: a correction is a new entry naming `supersedesId`.
 */
export function logOutcome(request: LogOutcomeRequest): Promise<OutcomeDto> {
  return api.post<OutcomeDto>('/outcomes', request);
}

export function useLogOutcome() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logOutcome,
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: outcomesQueryKey }),
        queryClient.invalidateQueries({ queryKey: workOrdersQueryKey }),
        queryClient.invalidateQueries({ queryKey: insightsQueryKey }),
      ]),
  });
}
