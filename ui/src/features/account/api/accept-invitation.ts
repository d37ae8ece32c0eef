import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AcceptInvitationRequest, AcceptInvitationResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/**
 * POST /api/invitations/accept (signed in): takes the share offered by an invitation link. The
 * link works once; an expired, used or withdrawn one answers 400 with `fields.token`.
 */
export function acceptInvitation(token: string): Promise<AcceptInvitationResponse> {
  return api.post<AcceptInvitationResponse>('/invitations/accept', { token } satisfies AcceptInvitationRequest);
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    // New cases to see: every cached list is out of date.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
