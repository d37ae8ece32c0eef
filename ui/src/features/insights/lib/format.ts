import { API_BASE } from '../../../lib/api-client';
import { humanizeId, type Labels } from '../../../lib/catalog';
import type { Calibration } from '../api/get-insights';
import { periodQueryString, type PeriodFilter } from '../../../lib/period';

/** A share as a whole percent ("45 %"); a dash when there is none. */
export function formatPercent(x: number | null | undefined, digits = 0): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  return `${(x * 100).toFixed(digits)} %`;
}

/** A score with three decimals; a dash when there is none. */
export function formatScore(x: number | null | undefined, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  return x.toFixed(digits);
}

export function formatMinutes(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  return `${Math.round(x)} min`;
}

export function formatCount(n: number): string {
  return n.toLocaleString();
}

export { humanizeId, labelsFrom, type Labels } from '../../../lib/catalog';

export type InsightTable = 'pairs' | 'labour' | 'wrong-way' | 'calibration';

/** The CSV export of one insight table for the same period and version. */
export function insightsCsvHref(table: InsightTable, filter: PeriodFilter): string {
  return `${API_BASE}/insights.csv${periodQueryString(filter, { table })}`;
}

export function outcomesCsvHref(filter: PeriodFilter): string {
  return `${API_BASE}/outcomes.csv${periodQueryString(filter)}`;
}

export interface ReliabilityPoint {
  /** Mean predicted probability in the bin (across). */
  predicted: number;
  /** Observed frequency in the bin (up). */
  observed: number;
  count: number;
  from: number;
  to: number;
}

/** The bins that hold predictions, as chart points (empty bins have no mean to plot). */
export function reliabilityPoints(c: Calibration): ReliabilityPoint[] {
  return c.bins
    .filter((b) => b.count > 0 && b.meanPredicted !== null && b.observed !== null)
    .map((b) => ({ predicted: b.meanPredicted!, observed: b.observed!, count: b.count, from: b.from, to: b.to }));
}

/**
 * A rule's name in words. Rule names read `<symptom>--<cause>[--<detail>]` or name a fact
 * (`fuel-older-than-a-month`): a symptom becomes its label in quotes, anything else words.
 */
export function ruleLabel(rule: string, labels: Labels): string {
  const [first, , detail] = rule.split('--');
  const symptom = labels.symptom(first);
  if (symptom !== humanizeId(first)) return detail ? `“${symptom}” (${humanizeId(detail).toLowerCase()})` : `“${symptom}”`;
  return humanizeId(rule.replace(/--/g, ' '));
}
