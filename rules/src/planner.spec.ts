/**
 * Plan optimality. Where the papers prove the greedy order optimal, its expected cost must equal
 * the brute-force minimum over every order; elsewhere the worst ratio found is printed.
 *
 * - No groups, independent actions, single fault: ordering by P/C is optimal
 *   (Kadane and Simon, "Optimal strategies for a class of constrained sequential problems",
 *   Annals of Statistics 5(2), 1977; Heckerman, Breese and Rommelse, "Decision-theoretic
 *   troubleshooting", Communications of the ACM 38(3), 1995).
 * - Groups that cost time to open once, results seen with the group open (inside information):
 *   the bottom-up P-over-C algorithm is optimal (Ottosen and Jensen, "The cost of
 *   troubleshooting cost clusters with inside information", UAI 2010).
 * - Not covered by those proofs: checks that overlap (several checks test one cause with
 *   sensitivity below 1), which is what the shipped catalog has.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bottomUpPOverC, expectedCost, pOverCOrder, type PlanAction } from './planner.js';

function permutations<T>(items: readonly T[]): T[][] {
  if (items.length <= 1) return [items.slice()];
  const out: T[][] = [];
  items.forEach((item, i) => {
    for (const rest of permutations([...items.slice(0, i), ...items.slice(i + 1)])) out.push([item, ...rest]);
  });
  return out;
}

function bruteForceMin(actions: readonly PlanAction[], opening: (g: string) => number): number {
  let best = Infinity;
  for (const order of permutations(actions)) best = Math.min(best, expectedCost(order, opening));
  return best;
}

const GROUPS = ['outside', 'g1', 'g2', 'g3'];

/** Up to 7 independent actions (probabilities summing to at most 1), in up to 3 groups that cost time to open. */
const instance = (maxGroups: number) =>
  fc
    .record({
      weights: fc.array(fc.integer({ min: 1, max: 100 }), { minLength: 1, maxLength: 7 }),
      found: fc.integer({ min: 30, max: 100 }),
      costs: fc.array(fc.integer({ min: 1, max: 30 }), { minLength: 7, maxLength: 7 }),
      groupOf: fc.array(fc.integer({ min: 0, max: maxGroups }), { minLength: 7, maxLength: 7 }),
      openings: fc.array(fc.integer({ min: 0, max: 25 }), { minLength: 4, maxLength: 4 }),
    })
    .map(({ weights, found, costs, groupOf, openings }) => {
      const total = weights.reduce((a, b) => a + b, 0);
      const actions: PlanAction[] = weights.map((w, i) => ({
        id: `a${i}`,
        group: GROUPS[groupOf[i]],
        probability: ((w / total) * found) / 100,
        cost: costs[i],
      }));
      const open = new Map(GROUPS.map((g, i) => [g, i === 0 ? 0 : openings[i]]));
      return { actions, opening: (g: string) => open.get(g) ?? 0 };
    });

describe('expected cost', () => {
  it('is worked out by hand for a small case, and group opening costs change the best order', () => {
    // X outside p 0.1, 1 min; Y and Z behind the float bowl (8 min to open): Y p 0.5, 2 min; Z p 0.3, 2 min.
    const X = { id: 'x', group: 'outside', probability: 0.1, cost: 1 };
    const Y = { id: 'y', group: 'bowl', probability: 0.5, cost: 2 };
    const Z = { id: 'z', group: 'bowl', probability: 0.3, cost: 2 };
    const opening = (g: string) => (g === 'bowl' ? 8 : 0);
    // X, Y, Z: 1 + (8 + 2) * 0.9 + 2 * 0.4 = 10.8.
    expect(expectedCost([X, Y, Z], opening)).toBeCloseTo(10.8, 12);
    // Y, Z, X: (8 + 2) + 2 * 0.5 + 1 * 0.2 = 11.2.
    expect(expectedCost([Y, Z, X], opening)).toBeCloseTo(11.2, 12);
    // P-over-C ignoring the opening cost puts Y first (0.25 > 0.15 > 0.1): the worse order.
    expect(pOverCOrder([X, Y, Z]).map((a) => a.id)).toEqual(['y', 'z', 'x']);
    // Bottom-up: the bowl's best prefix is Y+Z, 0.8 / 12 = 0.067 < 0.1, so X goes first.
    expect(bottomUpPOverC([X, Y, Z], opening).map((a) => a.id)).toEqual(['x', 'y', 'z']);
    expect(bruteForceMin([X, Y, Z], opening)).toBeCloseTo(10.8, 12);
  });
});

describe('optimality against brute force (fast-check, up to 7 checks)', () => {
  it('P-over-C is optimal with no groups (Kadane and Simon 1977; Heckerman, Breese and Rommelse 1995)', () => {
    fc.assert(
      fc.property(instance(0), ({ actions, opening }) => {
        const greedy = expectedCost(pOverCOrder(actions), opening);
        const best = bruteForceMin(actions, opening);
        expect(greedy).toBeCloseTo(best, 9);
      }),
      { numRuns: 200 },
    );
  });

  it('bottom-up P-over-C is optimal with up to 3 groups that cost time to open (Ottosen and Jensen, UAI 2010)', () => {
    fc.assert(
      fc.property(instance(3), ({ actions, opening }) => {
        const greedy = expectedCost(bottomUpPOverC(actions, opening), opening);
        const best = bruteForceMin(actions, opening);
        expect(greedy).toBeLessThanOrEqual(best + 1e-9);
        expect(greedy).toBeCloseTo(best, 9);
      }),
      { numRuns: 300 },
    );
  });

  it('plain P-over-C that ignores opening costs is not optimal with groups (so the extension matters)', () => {
    let worst = 1;
    fc.assert(
      fc.property(instance(3), ({ actions, opening }) => {
        const naive = expectedCost(pOverCOrder(actions), opening);
        worst = Math.max(worst, naive / bruteForceMin(actions, opening));
      }),
      { numRuns: 300, seed: 7 },
    );
    expect(worst).toBeGreaterThan(1.01);
  });
});

/**
 * Overlapping checks, the case the proofs do not cover: several checks test the same cause with
 * sensitivity below 1. Expected cost with a single fault: step i is reached when no earlier check
 * found the fault, with probability P(else) + sum_c P(c) prod_{j<i} (1 - sens_jc).
 */
describe('overlapping checks (outside the proofs): worst ratio to brute force', () => {
  interface Check {
    id: string;
    group: string;
    cost: number;
    sens: Map<number, number>;
  }
  const overlapping = fc
    .record({
      priors: fc.array(fc.integer({ min: 1, max: 50 }), { minLength: 2, maxLength: 4 }),
      checks: fc.array(
        fc.record({
          group: fc.integer({ min: 0, max: 3 }),
          cost: fc.integer({ min: 1, max: 20 }),
          tests: fc.array(fc.record({ cause: fc.integer({ min: 0, max: 3 }), sens: fc.integer({ min: 30, max: 95 }) }), { minLength: 1, maxLength: 3 }),
        }),
        { minLength: 2, maxLength: 6 },
      ),
      openings: fc.array(fc.integer({ min: 0, max: 15 }), { minLength: 4, maxLength: 4 }),
    })
    .map(({ priors, checks, openings }) => {
      const total = priors.reduce((a, b) => a + b, 0) / 0.85; // 15 % "something else"
      const prior = priors.map((w) => w / total);
      const list: Check[] = checks.map((c, i) => ({
        id: `c${i}`,
        group: GROUPS[c.group],
        cost: c.cost,
        sens: new Map(c.tests.filter((t) => t.cause < prior.length).map((t) => [t.cause, t.sens / 100])),
      }));
      const open = new Map(GROUPS.map((g, i) => [g, i === 0 ? 0 : openings[i]]));
      return { prior, checks: list.filter((c) => c.sens.size > 0), opening: (g: string) => open.get(g) ?? 0 };
    })
    .filter((x) => x.checks.length >= 2);

  function trueCost(order: Check[], prior: number[], opening: (g: string) => number): number {
    const mass = [...prior];
    const elseMass = 1 - prior.reduce((a, b) => a + b, 0);
    const opened = new Set<string>();
    let total = 0;
    for (const c of order) {
      const reach = elseMass + mass.reduce((a, b) => a + b, 0);
      const cost = c.cost + (opened.has(c.group) ? 0 : opening(c.group));
      opened.add(c.group);
      total += cost * reach;
      for (const [cause, s] of c.sens) mass[cause] *= 1 - s;
    }
    return total;
  }

  /** What the product does: after each "looks fine", update by Bayes and re-plan the rest. */
  function adaptiveOrder(checks: Check[], prior: number[], opening: (g: string) => number): Check[] {
    const mass = [...prior];
    const elseMass = 1 - prior.reduce((a, b) => a + b, 0);
    const left = [...checks];
    const opened = new Set<string>();
    const order: Check[] = [];
    while (left.length) {
      const z = elseMass + mass.reduce((a, b) => a + b, 0);
      const actions = left.map((c) => ({ id: c.id, group: c.group, cost: c.cost, probability: [...c.sens].reduce((s, [cause, sens]) => s + (mass[cause] / z) * sens, 0) }));
      const next = bottomUpPOverC(actions, (g) => (opened.has(g) ? 0 : opening(g)))[0];
      const check = left.splice(left.findIndex((c) => c.id === next.id), 1)[0];
      opened.add(check.group);
      order.push(check);
      for (const [cause, s] of check.sens) mass[cause] *= 1 - s;
    }
    return order;
  }

  it('prints the worst ratio of the re-planned greedy order to the best order', () => {
    let worstAdaptive = 1;
    let worstStatic = 1;
    fc.assert(
      fc.property(overlapping, ({ prior, checks, opening }) => {
        let best = Infinity;
        for (const order of permutations(checks)) best = Math.min(best, trueCost(order, prior, opening));
        const adaptive = trueCost(adaptiveOrder(checks, prior, opening), prior, opening);
        const staticActions = checks.map((c) => ({ id: c.id, group: c.group, cost: c.cost, probability: [...c.sens].reduce((s, [cause, sens]) => s + prior[cause] * sens, 0) }));
        const staticOrder = bottomUpPOverC(staticActions, opening).map((a) => checks.find((c) => c.id === a.id)!);
        const once = trueCost(staticOrder, prior, opening);
        // Nothing can beat the best order; a ratio below 1 would mean the cost model is wrong.
        expect(adaptive).toBeGreaterThanOrEqual(best - 1e-9);
        expect(once).toBeGreaterThanOrEqual(best - 1e-9);
        worstAdaptive = Math.max(worstAdaptive, adaptive / best);
        worstStatic = Math.max(worstStatic, once / best);
      }),
      { numRuns: 300, seed: 42 },
    );
    console.log(`overlapping checks, 300 random cases (seed 42): worst ratio re-planned greedy / best = ${worstAdaptive.toFixed(4)}, plan once / best = ${worstStatic.toFixed(4)}`);
    expect(Number.isFinite(worstAdaptive)).toBe(true);
  });
});
