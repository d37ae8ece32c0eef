import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { catalogQueryKey } from '../../../lib/catalog';
import { proposalQueryKey, type Proposal } from './get-proposal';
import { proposalsQueryKey } from './get-proposals';
import { rulesetsQueryKey } from '../../../lib/rulesets';

/** Screens that show the active version's catalog or figures refetch after a change of version. */
const insightsQueryKey = ['insights'] as const;

/** POST /api/rulesets/proposals/:id/publish (admin only): a new immutable version, made active. */
export function publishProposal({ id, notes }: { id: string; notes?: string }): Promise<Proposal> {
  return api.post<Proposal>(`/rulesets/proposals/${encodeURIComponent(id)}/publish`, notes ? { notes } : {});
}

export function usePublishProposal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: publishProposal,
    onSuccess: (p) => queryClient.setQueryData<Proposal>(proposalQueryKey(p.id), (old) => (old ? { ...old, status: p.status } : p)),
    onSettled: (_data, _error, { id }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: proposalQueryKey(id) }),
        queryClient.invalidateQueries({ queryKey: proposalsQueryKey }),
        queryClient.invalidateQueries({ queryKey: rulesetsQueryKey }),
        queryClient.invalidateQueries({ queryKey: catalogQueryKey }),
        queryClient.invalidateQueries({ queryKey: insightsQueryKey }),
      ]),
  });
}
