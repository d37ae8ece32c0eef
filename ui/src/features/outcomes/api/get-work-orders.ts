import { queryOptions, useQuery } from '@tanstack/react-query';
import type { WorkOrderDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/work-orders (shop): the shop's work orders, newest first (at most 500). */
export async function getWorkOrders(signal?: AbortSignal): Promise<WorkOrderDto[]> {
  const { workOrders } = await api.get<{ workOrders: WorkOrderDto[] }>('/work-orders', { signal });
  return workOrders;
}

export const workOrdersQueryKey = ['work-orders'] as const;

export function getWorkOrdersQueryOptions() {
  return queryOptions({ queryKey: workOrdersQueryKey, queryFn: ({ signal }) => getWorkOrders(signal) });
}

export function useWorkOrders() {
  return useQuery(getWorkOrdersQueryOptions());
}
