import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { sessionsQueryKey } from './get-sessions';

/** DELETE /api/karts/:id/sessions/:sessionId */
export async function deleteSession(kartId: string, sessionId: string): Promise<void> {
  await api.delete<void>(`/karts/${encodeURIComponent(kartId)}/sessions/${encodeURIComponent(sessionId)}`);
}

export function useDeleteSession(kartId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (sessionId: string) => deleteSession(kartId, sessionId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: sessionsQueryKey(kartId) }),
  });
}
