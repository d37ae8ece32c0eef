import { CASE_STATES, type CaseState, type CaseSummaryDto } from '@fuelwright/shared';

export const CASE_SORT_KEYS = ['kart', 'symptoms', 'opened', 'topCause', 'probability', 'state', 'updated'] as const;
export type CaseSortKey = (typeof CASE_SORT_KEYS)[number];
export type SortDirection = 'asc' | 'desc';

export interface CaseSort {
  key: CaseSortKey;
  dir: SortDirection;
}

export const CASE_SORT_LABELS: Record<CaseSortKey, string> = {
  kart: 'Kart',
  symptoms: 'Symptoms',
  opened: 'Opened',
  topCause: 'Top cause',
  probability: 'Probability',
  state: 'State',
  updated: 'Last change',
};

/** The most recently changed cases first, unless the user picks another order. */
export const DEFAULT_SORT: CaseSort = { key: 'updated', dir: 'desc' };

/** Dates and probabilities start with the largest; words start at A. */
export function firstDirection(key: CaseSortKey): SortDirection {
  return key === 'opened' || key === 'updated' || key === 'probability' ? 'desc' : 'asc';
}

export function isCaseState(value: string | null): value is CaseState {
  return value !== null && (CASE_STATES as readonly string[]).includes(value);
}

export function parseSort(key: string | null, dir: string | null): CaseSort {
  if (!key || !(CASE_SORT_KEYS as readonly string[]).includes(key)) return DEFAULT_SORT;
  const k = key as CaseSortKey;
  return { key: k, dir: dir === 'asc' || dir === 'desc' ? dir : firstDirection(k) };
}

/** Clicking a column: the same column flips, another column starts in its natural order. */
export function nextSort(current: CaseSort, key: CaseSortKey): CaseSort {
  if (current.key === key) return { key, dir: current.dir === 'asc' ? 'desc' : 'asc' };
  return { key, dir: firstDirection(key) };
}

export interface SortLabels {
  cause: (id: string) => string;
  symptom: (id: string) => string;
}

const collator = new Intl.Collator(undefined, { sensitivity: 'base', numeric: true });

/**
 * Sorts a copy of the list. Cases without the sorted value (no top cause yet) go last in either
 * direction; ties keep the newest change first.
 */
export function sortCases(cases: readonly CaseSummaryDto[], sort: CaseSort, labels: SortLabels): CaseSummaryDto[] {
  type Value = string | number | null;
  const valueOf = (c: CaseSummaryDto): Value => {
    switch (sort.key) {
      case 'kart':
        return c.kartName;
      case 'symptoms':
        return c.symptomIds.length > 0 ? labels.symptom(c.symptomIds[0]) : null;
      case 'opened':
        return Date.parse(c.openedAt);
      case 'updated':
        return Date.parse(c.updatedAt);
      case 'topCause':
        return c.topCauseId ? labels.cause(c.topCauseId) : null;
      case 'probability':
        return c.topCauseProbability;
      case 'state':
        return CASE_STATES.indexOf(c.state);
    }
  };
  const sign = sort.dir === 'asc' ? 1 : -1;
  return cases
    .map((c) => ({ c, v: valueOf(c) }))
    .sort((a, b) => {
      if (a.v === null || b.v === null) {
        if (a.v === null && b.v !== null) return 1;
        if (b.v === null && a.v !== null) return -1;
      } else {
        const byValue = typeof a.v === 'string' && typeof b.v === 'string' ? collator.compare(a.v, b.v) : (a.v as number) - (b.v as number);
        if (byValue !== 0) return sign * byValue;
      }
      return Date.parse(b.c.updatedAt) - Date.parse(a.c.updatedAt);
    })
    .map(({ c }) => c);
}

/** The filters applied to the loaded list in the page (state and kart are applied by the server). */
export interface CaseListFilter {
  /** A top cause id, or `NO_TOP_CAUSE` for cases not ranked yet. */
  cause?: string;
  /** First day the case was opened on, YYYY-MM-DD in the user's time zone. */
  from?: string;
  /** Last day (included), YYYY-MM-DD. */
  to?: string;
}

/** The cause filter's value for cases without a top cause yet. */
export const NO_TOP_CAUSE = 'none';

/** An ISO timestamp's day (YYYY-MM-DD) in the user's time zone, as a date field shows it. */
export function localDay(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '';
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/** The cases with that top cause, opened within the period (both ends included). */
export function filterCases(cases: readonly CaseSummaryDto[], filter: CaseListFilter): CaseSummaryDto[] {
  return cases.filter((c) => {
    if (filter.cause && (c.topCauseId ?? NO_TOP_CAUSE) !== filter.cause) return false;
    if (filter.from || filter.to) {
      const day = localDay(c.openedAt);
      if (filter.from && day < filter.from) return false;
      if (filter.to && day > filter.to) return false;
    }
    return true;
  });
}

/**
 * The top causes present in the list, by label, for the cause filter; "None yet" last when a case
 * has none; the chosen cause kept even when the list no longer holds it.
 */
export function topCauseOptions(cases: readonly CaseSummaryDto[], labels: Pick<SortLabels, 'cause'>, chosen?: string): { value: string; label: string }[] {
  const ids = new Set<string>();
  let unranked = false;
  for (const c of cases) {
    if (c.topCauseId) ids.add(c.topCauseId);
    else unranked = true;
  }
  if (chosen === NO_TOP_CAUSE) unranked = true;
  else if (chosen) ids.add(chosen);
  const options = [...ids].map((id) => ({ value: id, label: labels.cause(id) })).sort((a, b) => collator.compare(a.label, b.label));
  if (unranked) options.push({ value: NO_TOP_CAUSE, label: 'None yet' });
  return options;
}

/** A probability 0..1 as a whole percentage ("48%"); never rounded to 0% or 100% unless it is. */
export function formatProbability(p: number): string {
  if (!Number.isFinite(p)) return '—';
  const pct = p * 100;
  if (pct > 0 && pct < 1) return '<1%';
  if (pct > 99 && pct < 100) return '>99%';
  return `${Math.round(pct)}%`;
}
