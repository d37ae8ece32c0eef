import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProposalDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

export type { Accuracy, PriorChange, RuleChange, ProposalResult } from '@fuelwright/shared';

/** A proposal as GET /api/rulesets/proposals/:id sends it. */
export type Proposal = ProposalDto;

/** GET /api/rulesets/proposals/:id (shop, admin): status, progress 0..1, and the result when ready. */
export function getProposal(id: string, signal?: AbortSignal): Promise<Proposal> {
  return api.get<Proposal>(`/rulesets/proposals/${encodeURIComponent(id)}`, { signal });
}

export const proposalQueryKey = (id: string) => ['proposal', id] as const;

/** How often a running proposal is asked for its progress. */
export const PROPOSAL_POLL_MS = 500;

export function getProposalQueryOptions(id: string) {
  return queryOptions({
    queryKey: proposalQueryKey(id),
    queryFn: ({ signal }) => getProposal(id, signal),
    // The server fits in the background: poll while it runs, stop once it is done.
    refetchInterval: (query) => (query.state.data?.status === 'running' ? PROPOSAL_POLL_MS : false),
    refetchIntervalInBackground: false,
  });
}

export function useProposal(id: string) {
  return useQuery(getProposalQueryOptions(id));
}
