import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SetupDto, SetupInput } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { setupsQueryKey } from './get-setups';

/** POST /api/karts/:id/setups: answers with the new snapshot (and what changed against the one before). */
export function recordSetup(kartId: string, input: SetupInput): Promise<SetupDto> {
  return api.post<SetupDto>(`/karts/${encodeURIComponent(kartId)}/setups`, input);
}

export function useRecordSetup(kartId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SetupInput) => recordSetup(kartId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: setupsQueryKey(kartId) }),
  });
}
