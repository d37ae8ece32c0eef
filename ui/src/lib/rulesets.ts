import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RulesetsResponse } from '@fuelwright/shared';
import { api } from './api-client';

/*
 * The published ruleset versions, read by the rulesets screen and by the version filters of the
 * insights and the outcome log, so it lives here rather than in one of those features.
 */

/** GET /api/rulesets (shop, admin). */
export function getRulesets(signal?: AbortSignal): Promise<RulesetsResponse> {
  return api.get<RulesetsResponse>('/rulesets', { signal });
}

export const rulesetsQueryKey = ['rulesets'] as const;

export function getRulesetsQueryOptions() {
  return queryOptions({ queryKey: rulesetsQueryKey, queryFn: ({ signal }) => getRulesets(signal) });
}

/** `enabled`: false where the viewer may not read the versions (the query is not sent). */
export function useRulesets(enabled = true) {
  return useQuery({ ...getRulesetsQueryOptions(), enabled });
}
