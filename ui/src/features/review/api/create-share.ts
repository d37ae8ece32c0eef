import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateShareRequest, ShareDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { sharesQueryKey } from './get-shares';

/**
 * POST /api/shares: shares a kart or a case with a coach or shop. Every share starts as `invited`:
 * the invitee accepts through the single-use link e-mailed to them.
 */
export function createShare(request: CreateShareRequest): Promise<ShareDto> {
  return api.post<ShareDto>('/shares', request);
}

export function useCreateShare() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createShare,
    onSettled: () => queryClient.invalidateQueries({ queryKey: sharesQueryKey }),
  });
}
