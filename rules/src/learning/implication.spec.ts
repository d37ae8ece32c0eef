/** Rule implication (the refit's parents): hand-made cases, the shipped ruleset, and soundness on drawn requests. */
import { describe, expect, it } from 'vitest';
import { generateOutcomes } from '../../../fixtures/generate-outcomes.js';
import type { Condition, TopCondition } from '../model.js';
import { loadRuleset } from '../ruleset.js';
import { conditionImplies as implies, ruleImplies, ruleParents } from './implication.js';

const shows = (symptom: string, details: Record<string, string[]> = {}): Condition => ({ fact: 'symptoms', operator: 'shows', value: { symptom, ...details } });
const showsOnly = (symptom: string, details: Record<string, string[]>): Condition => ({ fact: 'symptoms', operator: 'showsOnly', value: { symptom, ...details } });
const leaf = (fact: string, operator: string, value: unknown): Condition => ({ fact, operator, value });
const all = (...c: Condition[]): TopCondition => ({ all: c });

describe('one condition implying another', () => {
  it('a symptom at a band implies the symptom, not the other way round', () => {
    expect(implies(shows('bog', { band: ['closed'] }), shows('bog'))).toBe(true);
    expect(implies(shows('bog'), shows('bog', { band: ['closed'] }))).toBe(false);
    expect(implies(shows('bog', { band: ['closed'] }), shows('bog', { band: ['closed', 'up-to-quarter'] }))).toBe(true);
    expect(implies(shows('bog', { band: ['closed', 'up-to-quarter'] }), shows('bog', { band: ['closed'] }))).toBe(false);
    expect(implies(shows('bog', { band: ['closed'] }), shows('hesitation'))).toBe(false);
  });

  it('"shows only" implies "shows" over a wider list, and "shows only" over a wider list', () => {
    const onlyTop = showsOnly('bog', { band: ['three-quarters-to-full'] });
    expect(implies(onlyTop, shows('bog'))).toBe(true);
    expect(implies(onlyTop, shows('bog', { band: ['three-quarters-to-full', 'quarter-to-three-quarters'] }))).toBe(true);
    expect(implies(onlyTop, showsOnly('bog', { band: ['three-quarters-to-full', 'quarter-to-three-quarters'] }))).toBe(true);
    expect(implies(shows('bog', { band: ['three-quarters-to-full'] }), onlyTop)).toBe(false);
    expect(implies(onlyTop, shows('bog', { engine: ['cold'] }))).toBe(false);
  });

  it('numeric ranges: >= 6 implies >= 3 and > 5 implies >= 5, not the reverse; = 2 implies < 3', () => {
    expect(implies(leaf('d', 'greaterThanInclusive', 6), leaf('d', 'greaterThanInclusive', 3))).toBe(true);
    expect(implies(leaf('d', 'greaterThanInclusive', 3), leaf('d', 'greaterThanInclusive', 6))).toBe(false);
    expect(implies(leaf('d', 'greaterThan', 5), leaf('d', 'greaterThanInclusive', 5))).toBe(true);
    expect(implies(leaf('d', 'greaterThanInclusive', 5), leaf('d', 'greaterThan', 5))).toBe(false);
    expect(implies(leaf('d', 'lessThanInclusive', -6), leaf('d', 'lessThanInclusive', -3))).toBe(true);
    expect(implies(leaf('d', 'equal', 2), leaf('d', 'lessThan', 3))).toBe(true);
    expect(implies(leaf('d', 'greaterThanInclusive', 6), leaf('e', 'greaterThanInclusive', 3))).toBe(false);
  });

  it('values: equal implies in / notEqual / notIn by membership', () => {
    expect(implies(leaf('idle', 'equal', 'set'), leaf('idle', 'in', ['set', 'other']))).toBe(true);
    expect(implies(leaf('idle', 'equal', 'set'), leaf('idle', 'notEqual', 'backed-off'))).toBe(true);
    expect(implies(leaf('idle', 'equal', 'set'), leaf('idle', 'notEqual', 'set'))).toBe(false);
    expect(implies(leaf('idle', 'in', ['a', 'b']), leaf('idle', 'notIn', ['c']))).toBe(true);
    expect(implies(leaf('idle', 'in', ['a', 'b']), leaf('idle', 'in', ['a']))).toBe(false);
    expect(implies(leaf('fitted', 'equal', true), leaf('fitted', 'equal', false))).toBe(false);
  });

  it('a "not" implies only an identical condition', () => {
    const n: Condition = { not: shows('bog') };
    expect(implies(n, { not: shows('bog') })).toBe(true);
    expect(implies(n, shows('bog'))).toBe(false);
  });

  it('a rule implies another when each of its conditions is implied by one of the first', () => {
    expect(ruleImplies(all(leaf('age', 'greaterThanInclusive', 14), leaf('age', 'lessThan', 30)), all(leaf('age', 'greaterThanInclusive', 14)))).toBe(true);
    expect(ruleImplies(all(shows('lean', { band: ['three-quarters-to-full'] }), leaf('d', 'greaterThanInclusive', 6)), all(shows('lean'), leaf('d', 'greaterThanInclusive', 3)))).toBe(true);
    expect(ruleImplies(all(shows('lean')), all(shows('lean'), leaf('d', 'greaterThanInclusive', 3)))).toBe(false);
  });
});

describe('parents in the shipped ruleset', () => {
  const ruleset = loadRuleset();
  const parents = ruleParents(ruleset.rules);

  it('has parents for band rules, stronger thresholds and setup-plus-symptom rules', () => {
    expect(parents.get('bog-on-acceleration--pilot-jet-wrong-or-blocked--closed')).toContain('bog-on-acceleration--pilot-jet-wrong-or-blocked');
    expect(parents.get('much-denser-air-lean-top')).toContain('denser-air-lean-top');
    expect(parents.get('idle-set-and-slow-deceleration')).toContain('idle-screw-recorded-set');
    expect(parents.get('fuel-older-than-a-month')).toEqual([]);
  });

  it('only names rules for the same cause', () => {
    const cause = new Map(ruleset.rules.map((r) => [r.name, r.event.type === 'likelihood' ? r.event.params.cause : undefined]));
    for (const [child, list] of parents) for (const p of list) expect(cause.get(p)).toBe(cause.get(child));
  });

  it('is sound: on 3,000 drawn requests, whenever a rule fired, all its parents fired too', () => {
    let checked = 0;
    const violations: string[] = [];
    for (const o of generateOutcomes({ count: 3000, seed: 'implication' })) {
      const fired = new Set(o.openingRank!.firedRules);
      for (const name of fired) {
        for (const p of parents.get(name) ?? []) {
          checked++;
          if (!fired.has(p)) violations.push(`${o.id}: ${name} fired without its parent ${p}`);
        }
      }
    }
    expect(violations).toEqual([]);
    expect(checked).toBeGreaterThan(1000);
  }, 60_000);
});
