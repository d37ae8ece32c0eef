import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** One published ruleset version (immutable once published). */
export interface RulesetVersionInfo {
  version: string;
  parentVersion: string | null;
  notes: string;
  active: boolean;
  publishedAt: string;
  publishedBy: string | null;
  rules: number;
  causes: number;
}

export interface RulesetsResponse {
  /** The version new cases are ranked with. */
  active: string;
  /** Oldest first. */
  versions: RulesetVersionInfo[];
}

/** GET /api/rulesets (shop, admin). */
export function getRulesets(signal?: AbortSignal): Promise<RulesetsResponse> {
  return api.get<RulesetsResponse>('/rulesets', { signal });
}

export const rulesetsQueryKey = ['rulesets'] as const;

export function getRulesetsQueryOptions() {
  return queryOptions({ queryKey: rulesetsQueryKey, queryFn: ({ signal }) => getRulesets(signal) });
}

export function useRulesets() {
  return useQuery(getRulesetsQueryOptions());
}
