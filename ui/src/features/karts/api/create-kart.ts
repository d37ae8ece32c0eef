import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { KartDto, KartInput } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { kartQueryKey } from './get-kart';
import { kartsQueryKey } from './get-karts';

/** POST /api/karts: answers with the new kart. */
export function createKart(input: KartInput): Promise<KartDto> {
  return api.post<KartDto>('/karts', input);
}

export function useCreateKart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createKart,
    onSuccess: (kart) => {
      queryClient.setQueryData(kartQueryKey(kart.id), kart);
      return queryClient.invalidateQueries({ queryKey: kartsQueryKey, exact: true });
    },
  });
}
