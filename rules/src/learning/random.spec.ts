/** Seeded randomness and the back-test split: deterministic, stable, and about the asked size. */
import { describe, expect, it } from 'vitest';
import { createRandom, hash32, hashUnit, isHeldOut, pickWeighted, sortedQuantile } from './random.js';

const ids = (n: number, prefix = 'outcome') => Array.from({ length: n }, (_, i) => `${prefix}-${i}`);

describe('back-test split', () => {
  it('is deterministic for a seed', () => {
    const a = ids(2000).filter((id) => isHeldOut(id, 7, 0.2));
    const b = ids(2000).filter((id) => isHeldOut(id, 7, 0.2));
    expect(a).toEqual(b);
  });

  it('depends on the seed', () => {
    const a = ids(2000).filter((id) => isHeldOut(id, 7, 0.2));
    const b = ids(2000).filter((id) => isHeldOut(id, 8, 0.2));
    expect(a).not.toEqual(b);
    expect(ids(2000).filter((id) => isHeldOut(id, 'seven', 0.2))).not.toEqual(a);
  });

  it('keeps every outcome on its side when outcomes are added or reordered', () => {
    const first = ids(3000);
    const before = new Map(first.map((id) => [id, isHeldOut(id, 42, 0.25)]));
    const grown = [...ids(1500, 'later'), ...first].reverse();
    for (const id of grown) if (before.has(id)) expect(isHeldOut(id, 42, 0.25)).toBe(before.get(id));
  });

  it('holds out about the asked fraction (binomial: within 4 standard deviations of 20,000 x 0.2)', () => {
    const n = 20_000;
    const held = ids(n).filter((id) => isHeldOut(id, 3, 0.2)).length;
    expect(Math.abs(held - n * 0.2)).toBeLessThan(4 * Math.sqrt(n * 0.2 * 0.8));
  });

  it('holds out a superset when the fraction grows, nothing at 0, and rejects fractions outside [0, 1)', () => {
    for (const id of ids(2000)) if (isHeldOut(id, 5, 0.1)) expect(isHeldOut(id, 5, 0.3)).toBe(true);
    expect(ids(500).some((id) => isHeldOut(id, 5, 0))).toBe(false);
    expect(() => isHeldOut('x', 5, 1)).toThrow(RangeError);
    expect(() => isHeldOut('x', 5, -0.1)).toThrow(RangeError);
  });
});

describe('hashing and the generator', () => {
  it('hashes to 32-bit values in [0, 1) and spreads similar keys', () => {
    expect(hash32('a')).not.toBe(hash32('b'));
    expect(hash32('a', 1)).not.toBe(hash32('a', 2));
    const u = ids(10_000).map((id) => hashUnit(id, 1));
    expect(Math.min(...u)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...u)).toBeLessThan(1);
    // Ten equal bins, each within 5 standard deviations of 1,000 (binomial).
    const bins = new Array(10).fill(0);
    for (const x of u) bins[Math.floor(x * 10)]++;
    for (const b of bins) expect(Math.abs(b - 1000)).toBeLessThan(5 * Math.sqrt(10_000 * 0.1 * 0.9));
  });

  it('repeats its sequence for a seed, never returns 0 or 1, and differs between seeds', () => {
    const a = createRandom('s');
    const b = createRandom('s');
    const c = createRandom('t');
    const xs = Array.from({ length: 1000 }, () => a());
    expect(Array.from({ length: 1000 }, () => b())).toEqual(xs);
    expect(Array.from({ length: 1000 }, () => c())).not.toEqual(xs);
    expect(xs.every((x) => x > 0 && x < 1)).toBe(true);
  });

  it('picks indices in proportion to weights (binomial, 5 standard deviations)', () => {
    const random = createRandom(1);
    const counts = [0, 0, 0];
    const n = 30_000;
    for (let i = 0; i < n; i++) counts[pickWeighted(random, [1, 0, 3])]++;
    expect(counts[1]).toBe(0);
    expect(Math.abs(counts[0] - n / 4)).toBeLessThan(5 * Math.sqrt(n * 0.25 * 0.75));
    expect(pickWeighted(random, [0, 0])).toBe(-1);
  });

  it('interpolates quantiles between order statistics (Hyndman & Fan 1996, definition 7)', () => {
    const s = [1, 2, 3, 4, 5];
    expect(sortedQuantile(s, 0)).toBe(1);
    expect(sortedQuantile(s, 0.5)).toBe(3);
    expect(sortedQuantile(s, 0.1)).toBeCloseTo(1.4, 12);
    expect(sortedQuantile(s, 1)).toBe(5);
  });
});
