import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { periodQueryString, type PeriodFilter } from '../../../lib/period';

/*
 * The insight figures as the server sends them (computed by the rules package's metric
 * accumulators, rules/src/learning/metrics.ts). A figure that has no value (a mean over nothing)
 * is NaN there and arrives as null.
 */

export interface RankingAccuracy {
  ranked: number;
  top1: number;
  top3: number;
  top1Rate: number;
  top3Rate: number;
  /** Mean multi-category Brier score, 0 (certain and right) to 2 (certain and wrong). */
  brier: number | null;
}

export interface CalibrationBin {
  from: number;
  to: number;
  count: number;
  meanPredicted: number | null;
  observed: number | null;
}

export interface Calibration {
  bins: CalibrationBin[];
  count: number;
  expectedCalibrationError: number | null;
}

export interface SymptomCausePair {
  symptom: string;
  cause: string;
  outcomes: number;
  shareOfSymptom: number;
}

export interface LabourByCause {
  cause: string;
  outcomes: number;
  meanMinutes: number;
  sdMinutes: number | null;
  minMinutes: number;
  maxMinutes: number;
}

export interface WrongWayRule {
  rule: string;
  cause: string;
  lr: number;
  direction: 'for' | 'against';
  fired: number;
  wrongWay: number;
  wrongWayRate: number;
}

export interface Insights {
  rulesetVersion: string;
  outcomes: number;
  skipped: number;
  withCase: number;
  walkIns: number;
  ranked: number;
  accuracy: RankingAccuracy;
  calibration: Calibration;
  topLabelCalibration: Calibration;
  symptomCausePairs: SymptomCausePair[];
  labourByCause: LabourByCause[];
  wrongWayRules: { rules: WrongWayRule[]; unknownRuleFirings: number };
  confirmed: { cause: string; outcomes: number }[];
  stillFixed: { yes: number; no: number; unknown: number };
}

export interface InsightsResponse {
  version: string;
  from: string | null;
  to: string | null;
  /** Cases opened in the period under this version. */
  cases: number;
  outcomes: number;
  insights: Insights;
}

/** GET /api/insights?from&to&version (shop, admin): one pass over the period's current outcomes. */
export function getInsights(filter: PeriodFilter, signal?: AbortSignal): Promise<InsightsResponse> {
  return api.get<InsightsResponse>(`/insights${periodQueryString(filter)}`, { signal });
}

export const insightsQueryKey = ['insights'] as const;

export function getInsightsQueryOptions(filter: PeriodFilter = {}) {
  return queryOptions({
    queryKey: [...insightsQueryKey, filter] as const,
    queryFn: ({ signal }) => getInsights(filter, signal),
    // The previous figures stay on screen while a new filter loads.
    placeholderData: keepPreviousData,
  });
}

export function useInsights(filter: PeriodFilter = {}) {
  return useQuery(getInsightsQueryOptions(filter));
}
