import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { KartDto, KartInput } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { kartsQueryKey } from './get-karts';

/** POST /api/karts: answers with the new kart. */
export function createKart(input: KartInput): Promise<KartDto> {
  return api.post<KartDto>('/karts', input);
}

/** Adds a kart from the walk-through (the kart list refreshes). */
export function useCreateKart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createKart,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: kartsQueryKey, exact: true }),
  });
}
