import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProposalDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/*
 * A ready proposal's `result`, as the rules package computes it (rules/src/learning/refine.ts,
 * without the ruleset source, which the server keeps to publish).
 */

export interface Accuracy {
  ranked: number;
  top1: number;
  top3: number;
  top1Rate: number;
  top3Rate: number;
  brier: number | null;
}

export interface PriorChange {
  cause: string;
  old: number;
  proposed: number;
  changed: boolean;
  evidence: {
    outcomes: number;
    weight: number;
    imputed: number;
    interval: [number, number];
    oldOutsideInterval: boolean;
  };
}

export interface RuleChange {
  rule: string;
  file: string;
  cause: string;
  old: number;
  proposed: number;
  changed: boolean;
  evidence: {
    outcomes: number;
    causeOutcomes: number;
    causeFired: number;
    referenceOutcomes: number;
    referenceFired: number;
    parents: string[];
    interval: [number, number];
    oldOutsideInterval: boolean;
    capped: boolean;
    kept: boolean;
    flat: boolean;
  };
}

export interface ProposalResult {
  fromVersion: string;
  version: string;
  priors: PriorChange[];
  rules: RuleChange[];
  changedPriors: number;
  changedRules: number;
  fit: { read: number; outcomes: number; withFiredRules: number; skipped: { noKnownCause: number; notStillFixed: number } };
  backTest: { heldOut: number; scored: number; skipped: number; before: Accuracy; after: Accuracy };
  settings: { strength: number; seed: number | string; holdOutFraction: number; intervalMass: number; draws: number };
}

export type Proposal = Omit<ProposalDto, 'result'> & { result: ProposalResult | null };

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
