import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProposalListResponse, ProposalSummaryDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/rulesets/proposals (shop, admin): the newest proposals first, without their diffs. */
export function getProposals(signal?: AbortSignal): Promise<ProposalSummaryDto[]> {
  return api.get<ProposalListResponse>('/rulesets/proposals', { signal }).then((r) => r.proposals);
}

/** Starting or publishing a proposal invalidates the list under this key. */
export const proposalsQueryKey = ['proposals'] as const;

/** How often the list asks again while one of its proposals runs (the proposal page polls faster). */
export const PROPOSALS_POLL_MS = 2000;

export function getProposalsQueryOptions() {
  return queryOptions({
    queryKey: proposalsQueryKey,
    queryFn: ({ signal }) => getProposals(signal),
    refetchInterval: (query) => (query.state.data?.some((p) => p.status === 'running') ? PROPOSALS_POLL_MS : false),
    refetchIntervalInBackground: false,
  });
}

export function useProposals() {
  return useQuery(getProposalsQueryOptions());
}
