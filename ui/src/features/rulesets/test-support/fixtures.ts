import type { ProposalSummaryDto } from '@fuelwright/shared';
import type { Proposal, ProposalResult } from '../api/get-proposal';

/** A ready proposal's result with two priors and two rules (invented numbers, no fact of the trade). */
export const RESULT: ProposalResult = {
  fromVersion: '1.0.0',
  version: '1.1.0',
  priors: [
    { cause: 'foam-degraded', old: 0.05, proposed: 0.0657, changed: true, evidence: { outcomes: 165, weight: 159, imputed: 82, interval: [0.0592, 0.0724], oldOutsideInterval: true } },
    { cause: 'fuel-level-high', old: 0.06, proposed: 0.06, changed: false, evidence: { outcomes: 3, weight: 3, imputed: 0, interval: [0.04, 0.09], oldOutsideInterval: false } },
  ],
  rules: [
    {
      rule: 'hesitation--foam-degraded',
      file: 'rules/bowl.json',
      cause: 'foam-degraded',
      old: 4,
      proposed: 4.46,
      changed: true,
      evidence: { outcomes: 329, causeOutcomes: 33.5, causeFired: 12.5, referenceOutcomes: 293, referenceFired: 24, parents: [], interval: [2.74, 7.17], oldOutsideInterval: false, capped: false, kept: false, flat: false },
    },
    {
      rule: 'fuel-from-vents--vent-lines-off',
      file: 'rules/vents.json',
      cause: 'vent-lines-off',
      old: 3,
      proposed: 3,
      changed: false,
      evidence: { outcomes: 0, causeOutcomes: 0, causeFired: 0, referenceOutcomes: 0, referenceFired: 0, parents: [], interval: [3, 3], oldOutsideInterval: false, capped: false, kept: true, flat: false },
    },
  ],
  changedPriors: 1,
  changedRules: 1,
  fit: { read: 500, outcomes: 380, withFiredRules: 380, skipped: { noKnownCause: 0, notStillFixed: 20 } },
  backTest: {
    heldOut: 100,
    scored: 100,
    skipped: 0,
    before: { ranked: 100, top1: 22, top3: 45, top1Rate: 0.22, top3Rate: 0.45, brier: 0.88 },
    after: { ranked: 100, top1: 25, top3: 49, top1Rate: 0.25, top3Rate: 0.49, brier: 0.85 },
  },
  settings: { strength: 200, seed: 1, holdOutFraction: 0.2, intervalMass: 0.9, draws: 2000 },
};

export function proposal(overrides: Partial<Proposal> = {}): Proposal {
  return {
    id: '7a0e7f3c-6f0b-4a41-9d2e-0d0c7b7e9a11',
    baseVersion: '1.0.0',
    proposedVersion: '1.1.0',
    strength: 200,
    seed: 1,
    holdOutFraction: 0.2,
    status: 'running',
    progress: 0,
    error: null,
    createdAt: '2026-11-20T09:00:00.000Z',
    finishedAt: null,
    result: null,
    ...overrides,
  };
}

/** A proposal as the list gives it (no diff); ready ones carry RESULT's back-test figures. */
export function proposalSummary(overrides: Partial<ProposalSummaryDto> = {}): ProposalSummaryDto {
  const { result: _result, ...rest } = proposal();
  return { ...rest, createdByName: 'Test shop', backTest: null, ...overrides };
}

const { heldOut, scored, before, after } = RESULT.backTest;
/** RESULT's back-test as the proposal list carries it. */
export const LIST_BACK_TEST: ProposalSummaryDto['backTest'] = {
  heldOut,
  scored,
  before: { top1Rate: before.top1Rate, top3Rate: before.top3Rate, brier: before.brier },
  after: { top1Rate: after.top1Rate, top3Rate: after.top3Rate, brier: after.brier },
};
