import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutboxMessageDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

export interface Outbox {
  /** True when the local capture server stands in for a real mail service (development, tests). */
  capturing: boolean;
  /** Newest first, at most 200. */
  messages: OutboxMessageDto[];
}

/** GET /api/admin/outbox (admin): what the app sent or is still retrying; 404 unless the local mail capture is in use. */
export function getOutbox(signal?: AbortSignal): Promise<Outbox> {
  return api.get<Outbox>('/admin/outbox', { signal });
}

export const outboxQueryKey = ['admin', 'outbox'] as const;

export function getOutboxQueryOptions() {
  return queryOptions({
    queryKey: outboxQueryKey,
    queryFn: ({ signal }) => getOutbox(signal),
    // The server sends what is due every few seconds: keep the page current while it is open
    // (not when it is not served: a real mail service is configured).
    refetchInterval: (query) => (query.state.error ? false : 5_000),
  });
}

export function useOutbox() {
  return useQuery(getOutboxQueryOptions());
}
