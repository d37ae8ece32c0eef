import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JettingSessionDto, JettingSessionInput } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { sessionsQueryKey } from './get-sessions';

/** POST /api/karts/:id/sessions: the service computes the densities from the air. */
export async function logSession(kartId: string, input: JettingSessionInput): Promise<JettingSessionDto> {
  return api.post<JettingSessionDto>(`/karts/${encodeURIComponent(kartId)}/sessions`, input);
}

export function useLogSession(kartId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: JettingSessionInput) => logSession(kartId, input),
    onSettled: () => queryClient.invalidateQueries({ queryKey: sessionsQueryKey(kartId) }),
  });
}
