import { useMutation } from '@tanstack/react-query';
import type { NoticeKind } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/notifications/unsubscribe (open): the link in a notice turns that kind of notice off. */
export async function unsubscribe(token: string): Promise<NoticeKind | string> {
  const { kind } = await api.post<{ kind: string }>('/notifications/unsubscribe', { token });
  return kind;
}

export function useUnsubscribe() {
  return useMutation({ mutationFn: unsubscribe });
}
