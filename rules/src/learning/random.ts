/**
 * Seeded randomness and hashing, so that every result of the learning core is reproducible from
 * its seed:
 * - `hash32`: the block step and finaliser of MurmurHash3 x86_32 (Austin Appleby) applied to the
 *   UTF-16 code units of a string, one unit per block (so not byte-compatible with MurmurHash3
 *   itself); `hashUnit(key, seed)` maps it to [0, 1).
 * - `isHeldOut(id, seed, fraction)`: the back-test split. Each outcome's side depends only on its
 *   id and the seed, so the split never changes when outcomes are added or reordered.
 * - `createRandom(seed)`: the sfc32 generator (Chris Doty-Humphrey's Small Fast Counting PRNG,
 *   as in PractRand), seeded through `hash32`; uniform doubles in (0, 1).
 * - Normal deviates by the Box-Muller transform; Gamma deviates by Marsaglia & Tsang (2000, ACM
 *   TOMS 26(3)), with the u^(1/a) boost for shapes below 1; Beta(a, b) = G_a / (G_a + G_b).
 */

/** MurmurHash3-style 32-bit hash of the UTF-16 code units of `key` (one unit per block). */
export function hash32(key: string, seed = 0): number {
  let h = seed >>> 0;
  for (let i = 0; i < key.length; i++) {
    let k = key.charCodeAt(i);
    k = Math.imul(k, 0xcc9e2d51);
    k = (k << 15) | (k >>> 17);
    k = Math.imul(k, 0x1b873593);
    h ^= k;
    h = (h << 13) | (h >>> 19);
    h = (Math.imul(h, 5) + 0xe6546b64) | 0;
  }
  h ^= key.length;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

/** A seed given as a number or a string, as a 32-bit integer. */
export function seedOf(seed: number | string): number {
  return typeof seed === 'number' && Number.isInteger(seed) ? seed >>> 0 : hash32(String(seed), 0x9e3779b9);
}

/** A stable pseudo-random number in [0, 1) for a key and a seed. */
export function hashUnit(key: string, seed: number | string = 0): number {
  return hash32(key, seedOf(seed)) / 4294967296;
}

/**
 * True when the outcome with this id is held out of the fit for the back-test. Deterministic in
 * (id, seed); a larger fraction holds out a superset of a smaller one's outcomes.
 */
export function isHeldOut(id: string, seed: number | string, fraction: number): boolean {
  if (!(fraction >= 0 && fraction < 1)) throw new RangeError(`hold-out fraction must be in [0, 1) (got ${fraction})`);
  return fraction > 0 && hashUnit(id, seed) < fraction;
}

/** A seeded source of uniform doubles in (0, 1). */
export type Random = () => number;

/** sfc32 seeded from a number or string. */
export function createRandom(seed: number | string): Random {
  const s = seedOf(seed);
  let a = hash32('a', s);
  let b = hash32('b', s);
  let c = hash32('c', s);
  let d = 1;
  const next = (): number => {
    const t = (((a + b) | 0) + d) | 0;
    d = (d + 1) | 0;
    a = b ^ (b >>> 9);
    b = (c + (c << 3)) | 0;
    c = (c << 21) | (c >>> 11);
    c = (c + t) | 0;
    return t >>> 0;
  };
  for (let i = 0; i < 15; i++) next();
  // (n + 0.5) / 2^32: never exactly 0 or 1, so logarithms are always finite.
  return () => (next() + 0.5) / 4294967296;
}

/** A standard normal deviate (Box-Muller). */
export function normal(random: Random): number {
  return Math.sqrt(-2 * Math.log(random())) * Math.cos(2 * Math.PI * random());
}

/** A Gamma(shape, 1) deviate (Marsaglia & Tsang 2000). */
export function gamma(random: Random, shape: number): number {
  if (!(shape > 0)) throw new RangeError(`gamma shape must be > 0 (got ${shape})`);
  if (shape < 1) return gamma(random, shape + 1) * Math.pow(random(), 1 / shape);
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  for (;;) {
    let x: number;
    let v: number;
    do {
      x = normal(random);
      v = 1 + c * x;
    } while (v <= 0);
    v = v * v * v;
    const u = random();
    if (u < 1 - 0.0331 * x * x * x * x) return d * v;
    if (Math.log(u) < 0.5 * x * x + d * (1 - v + Math.log(v))) return d * v;
  }
}

/** A Beta(a, b) deviate. */
export function beta(random: Random, a: number, b: number): number {
  const x = gamma(random, a);
  const y = gamma(random, b);
  return x / (x + y);
}

/** Index drawn from non-negative weights (need not sum to 1); -1 when they sum to 0. */
export function pickWeighted(random: Random, weights: ArrayLike<number>, total?: number): number {
  let sum = total ?? 0;
  if (total === undefined) for (let i = 0; i < weights.length; i++) sum += weights[i];
  if (!(sum > 0)) return -1;
  let u = random() * sum;
  for (let i = 0; i < weights.length; i++) {
    u -= weights[i];
    if (u < 0) return i;
  }
  for (let i = weights.length - 1; i >= 0; i--) if (weights[i] > 0) return i;
  return -1;
}

/** The q-quantile of sorted values (linear interpolation between order statistics, "type 7"). */
export function sortedQuantile(sorted: ArrayLike<number>, q: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  const h = (n - 1) * q;
  const lo = Math.floor(h);
  const hi = Math.min(n - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}
