import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { KartDto, KartInput } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { kartQueryKey } from './get-kart';
import { kartsQueryKey } from './get-karts';

/** PATCH /api/karts/:id: answers with the changed kart. */
export function updateKart(kartId: string, input: Partial<KartInput>): Promise<KartDto> {
  return api.patch<KartDto>(`/karts/${encodeURIComponent(kartId)}`, input);
}

export function useUpdateKart(kartId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<KartInput>) => updateKart(kartId, input),
    onSuccess: (kart) => {
      queryClient.setQueryData(kartQueryKey(kart.id), kart);
      return queryClient.invalidateQueries({ queryKey: kartsQueryKey, exact: true });
    },
  });
}
