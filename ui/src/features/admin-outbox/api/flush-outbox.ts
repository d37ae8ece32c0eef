import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { outboxQueryKey } from './get-outbox';

/** POST /api/admin/outbox/flush (admin): sends what is due now; answers how many went out. */
export async function flushOutbox(): Promise<number> {
  const { sent } = await api.post<{ sent: number }>('/admin/outbox/flush');
  return sent;
}

export function useFlushOutbox() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: flushOutbox,
    onSettled: () => queryClient.invalidateQueries({ queryKey: outboxQueryKey }),
  });
}
