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

/** A probability 0..1 as a whole percentage ("48%"); never rounded to 0% or 100% unless it is. */
export function formatProbability(p: number): string {
  if (!Number.isFinite(p)) return '—';
  const pct = p * 100;
  if (pct > 0 && pct < 1) return '<1%';
  if (pct > 99 && pct < 100) return '>99%';
  return `${Math.round(pct)}%`;
}
