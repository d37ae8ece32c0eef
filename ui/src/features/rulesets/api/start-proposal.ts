import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StartProposalRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { proposalQueryKey, type Proposal } from './get-proposal';
import { proposalsQueryKey } from './get-proposals';

/**
 * POST /api/rulesets/proposals (shop, admin): starts a re-fit of the priors and likelihood ratios
 * from the outcomes, in the background. 409 while another one runs; 400 names the fields.
 */
export function startProposal(request: StartProposalRequest): Promise<Proposal> {
  return api.post<Proposal>('/rulesets/proposals', request);
}

export function useStartProposal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startProposal,
    onSuccess: (p) => queryClient.setQueryData(proposalQueryKey(p.id), p),
    onSettled: () => queryClient.invalidateQueries({ queryKey: proposalsQueryKey }),
  });
}
