/**
 * When one rule's conditions imply another's. The refit uses it to find each rule's "parents":
 * the rules for the same cause that always fire when it fires (a symptom's general rule is the
 * parent of the same symptom's rule for one throttle band). The engine multiplies the ratios of
 * every fired rule, so a child rule's ratio must be the evidence it adds on top of its parents:
 * it is estimated on the outcomes where all its parents fired (the chain rule,
 * P(A and B | h) = P(A | h) P(B | A, h)).
 *
 * The test is syntactic and sound (it never claims an implication that does not hold) but not
 * complete: rule R implies rule S when every condition of S's top-level `all` is implied by one
 * condition of R's. One condition implies another when they are identical, or:
 * - `shows` / `showsOnly` of the same symptom implies `shows` of it when, for every detail the
 *   implied condition names, the implying one names only values in its list;
 * - `showsOnly` implies `showsOnly` under the same test;
 * - numeric comparisons of the same fact: the implying one's range lies inside the other's;
 * - `equal` / `in` imply `in`, `notEqual`, `notIn` by set containment or disjointness.
 */
import type { Condition, RuleDefinition, TopCondition } from '../model.js';

const DETAILS = ['band', 'engine', 'where'] as const;

type Leaf = Extract<Condition, { fact: string }>;
const isLeaf = (c: Condition): c is Leaf => 'fact' in c;

/** JSON with object keys sorted, so equal conditions give equal strings. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const keys = Object.keys(value as object).sort();
    return `{${keys.map((k) => `${JSON.stringify(k)}:${canonical((value as Record<string, unknown>)[k])}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

function topLeaves(c: TopCondition): Condition[] {
  return 'all' in c ? c.all : [c];
}

interface Range {
  lo: number;
  loIn: boolean;
  hi: number;
  hiIn: boolean;
}

function rangeOf(leaf: Leaf): Range | undefined {
  const v = leaf.value;
  if (typeof v !== 'number') return undefined;
  switch (leaf.operator) {
    case 'lessThan':
      return { lo: -Infinity, loIn: false, hi: v, hiIn: false };
    case 'lessThanInclusive':
      return { lo: -Infinity, loIn: false, hi: v, hiIn: true };
    case 'greaterThan':
      return { lo: v, loIn: false, hi: Infinity, hiIn: false };
    case 'greaterThanInclusive':
      return { lo: v, loIn: true, hi: Infinity, hiIn: false };
    case 'equal':
      return { lo: v, loIn: true, hi: v, hiIn: true };
    default:
      return undefined;
  }
}

function rangeInside(inner: Range, outer: Range): boolean {
  const loOk = inner.lo > outer.lo || (inner.lo === outer.lo && (outer.loIn || !inner.loIn));
  const hiOk = inner.hi < outer.hi || (inner.hi === outer.hi && (outer.hiIn || !inner.hiIn));
  return loOk && hiOk;
}

type Details = Partial<Record<(typeof DETAILS)[number], string[]>> & { symptom: string };

function detailsWithin(a: Details, b: Details): boolean {
  for (const d of DETAILS) {
    const want = b[d];
    if (!want) continue;
    const have = a[d];
    if (!have || !have.every((x) => want.includes(x))) return false;
  }
  return true;
}

/** True when condition `a` being true makes condition `b` true. */
export function conditionImplies(a: Condition, b: Condition): boolean {
  if (canonical(a) === canonical(b)) return true;
  if (!isLeaf(a) || !isLeaf(b) || a.fact !== b.fact) return false;
  if (a.fact === 'symptoms') {
    const va = a.value as Details;
    const vb = b.value as Details;
    if (va.symptom !== vb.symptom) return false;
    if (b.operator === 'shows') return (a.operator === 'shows' || a.operator === 'showsOnly') && detailsWithin(va, vb);
    if (b.operator === 'showsOnly') return a.operator === 'showsOnly' && detailsWithin(va, vb);
    return false;
  }
  const ra = rangeOf(a);
  const rb = rangeOf(b);
  if (ra && rb) return rangeInside(ra, rb);
  // Sets of values a makes possible, and what b needs of them.
  const possible = a.operator === 'equal' ? [a.value] : a.operator === 'in' && Array.isArray(a.value) ? (a.value as unknown[]) : undefined;
  if (!possible) return false;
  switch (b.operator) {
    case 'equal':
      return possible.length === 1 && possible[0] === b.value;
    case 'in':
      return Array.isArray(b.value) && possible.every((x) => (b.value as unknown[]).includes(x));
    case 'notEqual':
      return possible.every((x) => x !== b.value);
    case 'notIn':
      return Array.isArray(b.value) && possible.every((x) => !(b.value as unknown[]).includes(x));
    default:
      return false;
  }
}

/** True when rule conditions `a` being true make conditions `b` true (see the module note). */
export function ruleImplies(a: TopCondition, b: TopCondition): boolean {
  const la = topLeaves(a);
  return topLeaves(b).every((cb) => la.some((ca) => conditionImplies(ca, cb)));
}

/**
 * For each likelihood rule, the other likelihood rules for the same cause that fire whenever it
 * fires. Two rules with equivalent conditions: the earlier one is the parent of the later.
 */
export function ruleParents(rules: readonly RuleDefinition[]): Map<string, string[]> {
  const byCause = new Map<string, { rule: RuleDefinition; pos: number }[]>();
  rules.forEach((rule, pos) => {
    if (rule.event.type !== 'likelihood') return;
    const list = byCause.get(rule.event.params.cause);
    if (list) list.push({ rule, pos });
    else byCause.set(rule.event.params.cause, [{ rule, pos }]);
  });
  const out = new Map<string, string[]>();
  for (const list of byCause.values()) {
    for (const child of list) {
      const parents: string[] = [];
      for (const other of list) {
        if (other === child) continue;
        if (!ruleImplies(child.rule.conditions, other.rule.conditions)) continue;
        if (ruleImplies(other.rule.conditions, child.rule.conditions) && other.pos > child.pos) continue;
        parents.push(other.rule.name);
      }
      out.set(child.rule.name, parents);
    }
  }
  return out;
}
