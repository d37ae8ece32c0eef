import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface RulesetVersionSummary {
  version: string;
  active: boolean;
  publishedAt: string;
}

/** GET /api/rulesets (shop, admin): the published versions, for the version filter. */
export async function getRulesetVersions(signal?: AbortSignal): Promise<{ active: string; versions: RulesetVersionSummary[] }> {
  return api.get<{ active: string; versions: RulesetVersionSummary[] }>('/rulesets', { signal });
}

export const rulesetVersionsQueryKey = ['rulesets'] as const;

export function getRulesetVersionsQueryOptions() {
  return queryOptions({ queryKey: rulesetVersionsQueryKey, queryFn: ({ signal }) => getRulesetVersions(signal) });
}

export function useRulesetVersions(enabled = true) {
  return useQuery({ ...getRulesetVersionsQueryOptions(), enabled });
}
