import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateWorkOrderRequest, WorkOrderDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { workOrdersQueryKey } from './get-work-orders';

/**
 * POST /api/work-orders (shop): for a case shared with the shop (`caseId`), or a walk-in with the
 * customer, the kart and its symptoms entered on the spot. 400 names the fields.
 */
export function createWorkOrder(request: CreateWorkOrderRequest): Promise<WorkOrderDto> {
  return api.post<WorkOrderDto>('/work-orders', request);
}

export function useCreateWorkOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createWorkOrder,
    onSuccess: (created) => queryClient.setQueryData<WorkOrderDto[]>(workOrdersQueryKey, (list) => (list ? [created, ...list] : list)),
    onSettled: () => queryClient.invalidateQueries({ queryKey: workOrdersQueryKey }),
  });
}
