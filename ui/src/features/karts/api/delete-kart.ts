import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { kartQueryKey } from './get-kart';
import { kartsQueryKey } from './get-karts';

/** DELETE /api/karts/:id: the kart goes, with its setups, jetting log and cases. */
export function deleteKart(kartId: string): Promise<void> {
  return api.delete<void>(`/karts/${encodeURIComponent(kartId)}`);
}

/** Cases of a deleted kart go with it: their lists are stale too. */
const casesQueryKey = ['cases'] as const;

export function useDeleteKart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteKart,
    onSuccess: (_, kartId) => {
      queryClient.removeQueries({ queryKey: kartQueryKey(kartId) });
      void queryClient.invalidateQueries({ queryKey: casesQueryKey });
      return queryClient.invalidateQueries({ queryKey: kartsQueryKey, exact: true });
    },
  });
}
