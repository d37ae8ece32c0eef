import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { JetKit, JetKitResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { jetKitQueryKey } from './get-jet-kit';

/** PUT /api/karts/:id/jet-kit */
export async function saveJetKit(kartId: string, jetKit: JetKit): Promise<JetKitResponse> {
  return api.put<JetKitResponse>(`/karts/${encodeURIComponent(kartId)}/jet-kit`, jetKit);
}

export function useSaveJetKit(kartId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (jetKit: JetKit) => saveJetKit(kartId, jetKit),
    onSuccess: (saved) => queryClient.setQueryData(jetKitQueryKey(kartId), saved),
    onSettled: () => queryClient.invalidateQueries({ queryKey: jetKitQueryKey(kartId) }),
  });
}
