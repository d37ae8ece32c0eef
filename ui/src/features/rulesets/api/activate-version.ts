import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { catalogQueryKey } from '../../../lib/catalog';
import { rulesetsQueryKey } from '../../../lib/rulesets';

const insightsQueryKey = ['insights'] as const;

/** POST /api/rulesets/:version/activate (admin only): roll back (or forward); nothing is deleted. */
export function activateVersion(version: string): Promise<{ active: string }> {
  return api.post<{ active: string }>(`/rulesets/${encodeURIComponent(version)}/activate`);
}

export function useActivateVersion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: activateVersion,
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: rulesetsQueryKey }),
        queryClient.invalidateQueries({ queryKey: catalogQueryKey }),
        queryClient.invalidateQueries({ queryKey: insightsQueryKey }),
      ]),
  });
}
