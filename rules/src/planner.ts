/**
 * Check planning: the order of checks that minimises the expected time to find the fault.
 *
 * Model (decision-theoretic troubleshooting with independent actions): check i finds the fault
 * with probability p_i (the probabilities add up to at most 1), costs c_i minutes, and belongs to
 * a disassembly group that costs O_g minutes to open, once. The result of a check is seen while
 * its group is open ("inside information": nothing has to be closed to know whether the fault was
 * found). Work stops when the fault is found. The expected cost of an order is
 *   ECR = sum_i (c_i + [i opens its group] O_g) (1 - sum_{j<i} p_j).
 *
 * Without groups, sorting by efficiency p/c ("P-over-C") is optimal (Kadane and Simon, "Optimal
 * strategies for a class of constrained sequential problems", Annals of Statistics 5(2), 1977;
 * Heckerman, Breese and Rommelse, "Decision-theoretic troubleshooting", CACM 38(3), 1995).
 * With groups, the bottom-up P-over-C algorithm (Ottosen and Jensen, "The cost of troubleshooting
 * cost clusters with inside information", UAI 2010) is optimal for the inside-information model:
 * in each group, sort by efficiency, merge the prefix whose efficiency counting the opening cost
 * is highest into one compound action, leave the rest as free actions, then sort everything at
 * the top level by efficiency and expand the compounds.
 */

export interface PlanAction {
  id: string;
  group: string;
  /** Probability the action finds the fault. */
  probability: number;
  /** Minutes of the action itself, excluding the group opening; must be > 0. */
  cost: number;
}

/** Opening cost of a group (0 for the group everything starts in). */
export type OpeningCost = (group: string) => number;

function byEfficiency(a: { ef: number; compound: boolean; p: number; id: string }, b: { ef: number; compound: boolean; p: number; id: string }): number {
  if (a.ef !== b.ef) return b.ef - a.ef;
  if (a.compound !== b.compound) return a.compound ? -1 : 1;
  if (a.p !== b.p) return b.p - a.p;
  return a.id < b.id ? -1 : a.id > b.id ? 1 : 0;
}

/** Plain P-over-C order (no group costs). */
export function pOverCOrder<A extends PlanAction>(actions: readonly A[]): A[] {
  return actions
    .map((a) => ({ a, ef: a.probability / a.cost, compound: false, p: a.probability, id: a.id }))
    .sort(byEfficiency)
    .map((x) => x.a);
}

/** The bottom-up P-over-C order for one level of groups under the top level. */
export function bottomUpPOverC<A extends PlanAction>(actions: readonly A[], openingCost: OpeningCost): A[] {
  const byGroup = new Map<string, A[]>();
  for (const a of actions) {
    const list = byGroup.get(a.group);
    if (list) list.push(a);
    else byGroup.set(a.group, [a]);
  }
  const top: { ef: number; compound: boolean; p: number; id: string; members: A[] }[] = [];
  for (const [group, members] of byGroup) {
    const sorted = pOverCOrder(members);
    const open = openingCost(group);
    if (open <= 0) {
      for (const a of sorted) top.push({ ef: a.probability / a.cost, compound: false, p: a.probability, id: a.id, members: [a] });
      continue;
    }
    // The prefix with the highest efficiency once the opening cost is counted.
    let bestEnd = 1;
    let bestEf = -Infinity;
    let p = 0;
    let c = open;
    for (let i = 0; i < sorted.length; i++) {
      p += sorted[i].probability;
      c += sorted[i].cost;
      const ef = p / c;
      if (ef > bestEf) {
        bestEf = ef;
        bestEnd = i + 1;
      }
    }
    const prefix = sorted.slice(0, bestEnd);
    top.push({ ef: bestEf, compound: true, p: prefix.reduce((s, a) => s + a.probability, 0), id: prefix[0].id, members: prefix });
    for (const a of sorted.slice(bestEnd)) top.push({ ef: a.probability / a.cost, compound: false, p: a.probability, id: a.id, members: [a] });
  }
  top.sort(byEfficiency);
  return top.flatMap((t) => t.members);
}

/** Expected cost (minutes) of doing the actions in this order, with each group opened once. */
export function expectedCost(order: readonly PlanAction[], openingCost: OpeningCost): number {
  const opened = new Set<string>();
  let notFound = 1;
  let total = 0;
  for (const a of order) {
    let cost = a.cost;
    if (!opened.has(a.group)) {
      opened.add(a.group);
      cost += openingCost(a.group);
    }
    total += cost * Math.max(0, notFound);
    notFound -= a.probability;
  }
  return total;
}
