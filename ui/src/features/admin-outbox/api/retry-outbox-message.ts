import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { outboxQueryKey } from './get-outbox';

/** POST /api/admin/outbox/:id/retry (admin): queues a failed message again, with a fresh retry schedule. */
export async function retryOutboxMessage(id: string): Promise<void> {
  await api.post<{ id: string; status: 'pending' }>(`/admin/outbox/${encodeURIComponent(id)}/retry`);
}

export function useRetryOutboxMessage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryOutboxMessage,
    onSettled: () => queryClient.invalidateQueries({ queryKey: outboxQueryKey }),
  });
}
