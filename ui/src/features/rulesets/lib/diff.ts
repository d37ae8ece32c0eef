import type { PriorChange, RuleChange } from '../api/get-proposal';

/** One weight of the proposal, prior or rule likelihood ratio, as the diff table shows it. */
export interface DiffRow {
  kind: 'prior' | 'rule';
  /** Cause id (a prior) or rule name. */
  id: string;
  cause: string;
  /** Rule file, for rules. */
  file?: string;
  old: number;
  proposed: number;
  changed: boolean;
  /** Outcomes behind the estimate. */
  outcomes: number;
  /** Outcomes of the rule's own cause (weighted), for rules. */
  causeOutcomes?: number;
  interval: [number, number];
  /** The old value lies outside the 90 % interval: the outcomes disagree with it. */
  disagrees: boolean;
  /** No outcome of the rule's cause: the expert value is kept. */
  kept: boolean;
  /** The estimate rounded to 1 and was nudged: a candidate for removal. */
  flat: boolean;
}

export function priorRows(priors: readonly PriorChange[]): DiffRow[] {
  return priors.map((p) => ({
    kind: 'prior',
    id: p.cause,
    cause: p.cause,
    old: p.old,
    proposed: p.proposed,
    changed: p.changed,
    outcomes: p.evidence.outcomes,
    interval: p.evidence.interval,
    disagrees: p.evidence.oldOutsideInterval,
    kept: false,
    flat: false,
  }));
}

export function ruleRows(rules: readonly RuleChange[]): DiffRow[] {
  return rules.map((r) => ({
    kind: 'rule',
    id: r.rule,
    cause: r.cause,
    file: r.file,
    old: r.old,
    proposed: r.proposed,
    changed: r.changed,
    outcomes: r.evidence.outcomes,
    causeOutcomes: r.evidence.causeOutcomes,
    interval: r.evidence.interval,
    disagrees: r.evidence.oldOutsideInterval,
    kept: r.evidence.kept,
    flat: r.evidence.flat,
  }));
}

/** How far the proposal moves a value, on a log scale (0 = unchanged). */
export function logChange(row: Pick<DiffRow, 'old' | 'proposed'>): number {
  return row.old > 0 && row.proposed > 0 ? Math.abs(Math.log(row.proposed / row.old)) : 0;
}

/** Changed ones first; among them those the outcomes contradict, then the largest moves; then by name. */
export function sortRows(rows: readonly DiffRow[]): DiffRow[] {
  return [...rows].sort(
    (a, b) =>
      Number(b.changed) - Number(a.changed) ||
      Number(b.disagrees) - Number(a.disagrees) ||
      logChange(b) - logChange(a) ||
      a.id.localeCompare(b.id),
  );
}

export type DiffShow = 'changed' | 'disagrees' | 'all';

/** Rows shown for a choice and a search text (matches the id, the cause id or label, the file, and `rowWords`). */
export function filterRows(
  rows: readonly DiffRow[],
  show: DiffShow,
  text: string,
  causeLabel: (id: string) => string,
  /** More words a row is found by (a rule's name in words). */
  rowWords: (row: DiffRow) => string = () => '',
): DiffRow[] {
  const words = text.trim().toLowerCase().split(/\s+/).filter(Boolean);
  return rows.filter((r) => {
    if (show === 'changed' && !r.changed) return false;
    if (show === 'disagrees' && !r.disagrees) return false;
    if (words.length === 0) return true;
    const hay = `${r.id} ${r.cause} ${causeLabel(r.cause)} ${r.file ?? ''} ${rowWords(r)}`.toLowerCase();
    return words.every((w) => hay.includes(w));
  });
}

/** A weight with three significant digits ("0.0657", "4.46", "12"); the far tails of an interval as bounds. */
export function formatWeight(x: number): string {
  if (!Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  if (x > 0 && x < 1e-4) return '< 0.0001';
  if (x >= 1e5) return '> 100000';
  return Number(x.toPrecision(3)).toString();
}

/** A credible interval in words where a tail runs off the scale ("0.0196–0.188", "up to 0.0242", "too few outcomes to bound"). */
export function formatInterval([lo, hi]: readonly [number, number]): string {
  const low = !(lo >= 1e-4);
  const high = hi >= 1e5;
  if (low && high) return 'too wide to bound (too few outcomes)';
  if (low) return hi < 1e-4 ? 'below 0.0001' : `up to ${formatWeight(hi)}`;
  if (high) return `${formatWeight(lo)} or more`;
  return `${formatWeight(lo)}–${formatWeight(hi)}`;
}

/** An id as words ("fuel-older-than-a-month" -> "Fuel older than a month"). */
export function humanizeId(id: string): string {
  const words = id.replace(/[-_]+/g, ' ').trim();
  return words ? words[0].toUpperCase() + words.slice(1) : id;
}

/**
 * A rule's name in words. Rule names read `<symptom>--<cause>[--<detail>]` or name a fact
 * (`fuel-older-than-a-month`): a known symptom becomes its label in quotes, anything else words.
 */
export function ruleLabel(rule: string, symptomLabel: (id: string) => string | undefined): string {
  const [first, , detail] = rule.split('--');
  const symptom = symptomLabel(first);
  if (symptom) return detail ? `“${symptom}” (${humanizeId(detail).toLowerCase()})` : `“${symptom}”`;
  return humanizeId(rule.replace(/--/g, ' '));
}

/** The move from old to proposed as a signed percent ("+31 %", "−12 %", "0 %"). */
export function formatChange(old: number, proposed: number): string {
  if (!(old > 0) || !Number.isFinite(proposed)) return '—';
  const pct = Math.round((proposed / old - 1) * 100);
  if (pct === 0) return '0 %';
  return `${pct > 0 ? '+' : '−'}${Math.abs(pct)} %`;
}
