import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShareDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { sharesQueryKey } from './get-shares';

/** DELETE /api/shares/:id (owner): ends the grantee's access at once; answers with the revoked share. */
export function revokeShare(shareId: string): Promise<ShareDto> {
  return api.delete<ShareDto>(`/shares/${encodeURIComponent(shareId)}`);
}

export function useRevokeShare() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeShare,
    onSettled: () => queryClient.invalidateQueries({ queryKey: sharesQueryKey }),
  });
}
