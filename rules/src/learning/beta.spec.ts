/**
 * The Beta distribution functions against closed forms, an exact identity, published tables and
 * a reference library. Sources are named beside each check.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { betaInterval, betaQuantile, lnBeta, lnGamma, regularizedIncompleteBeta as I } from './beta.js';

/** ln(n!) by summing logarithms (independent of lnGamma). */
function lnFactorial(n: number): number {
  let s = 0;
  for (let k = 2; k <= n; k++) s += Math.log(k);
  return s;
}

/**
 * Binomial tail P(Bin(n, x) >= a), summed term by term in log space. Identity: for integers a, b,
 * I_x(a, b) = P(Bin(a + b - 1, x) >= a) (the incomplete beta function's relation to the binomial
 * distribution, Abramowitz & Stegun 1964, ch. 26, section 26.5; equation number from memory: 26.5.24).
 */
function binomialTail(n: number, a: number, x: number): number {
  let s = 0;
  for (let j = a; j <= n; j++) s += Math.exp(lnFactorial(n) - lnFactorial(j) - lnFactorial(n - j) + j * Math.log(x) + (n - j) * Math.log1p(-x));
  return s;
}

describe('lnGamma', () => {
  it('gives ln((n-1)!) for whole numbers (definition of the gamma function on integers)', () => {
    for (const n of [1, 2, 3, 5, 10, 20, 171, 1000, 50_001]) expect(lnGamma(n)).toBeCloseTo(lnFactorial(n - 1), n > 1000 ? 6 : 10);
  });

  it('gives Gamma(1/2) = sqrt(pi) and Gamma(3/2) = sqrt(pi)/2 (standard identities, Abramowitz & Stegun 1964, ch. 6)', () => {
    expect(Math.exp(lnGamma(0.5))).toBeCloseTo(Math.sqrt(Math.PI), 13);
    expect(Math.exp(lnGamma(1.5))).toBeCloseTo(Math.sqrt(Math.PI) / 2, 13);
  });

  it('gives ln B(a, b) = ln(1/a) when b = 1 (B(a, 1) = 1/a, from the definition of the beta function)', () => {
    for (const a of [0.3, 2, 7.5, 400]) expect(lnBeta(a, 1)).toBeCloseTo(-Math.log(a), 11);
  });

  it('rejects x <= 0', () => {
    expect(() => lnGamma(0)).toThrow(RangeError);
  });
});

describe('regularized incomplete beta I_x(a, b)', () => {
  it('matches the closed forms I_x(a, 1) = x^a, I_x(1, b) = 1 - (1 - x)^b and I_x(1/2, 1/2) = (2/pi) asin(sqrt x) (integrals of the Beta density, from its definition)', () => {
    for (const x of [0.01, 0.2, 0.5, 0.77, 0.999]) {
      for (const a of [0.4, 1, 3.5, 60]) expect(I(x, a, 1)).toBeCloseTo(Math.pow(x, a), 12);
      for (const b of [0.4, 1, 3.5, 60]) expect(I(x, 1, b)).toBeCloseTo(1 - Math.pow(1 - x, b), 12);
      expect(I(x, 0.5, 0.5)).toBeCloseTo((2 / Math.PI) * Math.asin(Math.sqrt(x)), 12);
    }
  });

  it('matches the binomial tail for whole-number parameters, small and large (A&S 26.5, see binomialTail)', () => {
    const cases: [number, number, number][] = [
      [5, 3, 0.3],
      [5, 3, 0.8],
      [2, 2, 0.5],
      [40, 60, 0.35],
      [40, 60, 0.45],
      [300, 700, 0.29],
      [300, 700, 0.31],
    ];
    for (const [a, b, x] of cases) expect(Math.abs(I(x, a, b) - binomialTail(a + b - 1, a, x))).toBeLessThan(1e-11);
  });

  it('has the symmetry I_x(a, b) = 1 - I_{1-x}(b, a) (from the definition)', () => {
    for (const [a, b, x] of [
      [2.5, 40.5, 0.02],
      [0.3, 0.7, 0.6],
      [1200.5, 48800.5, 0.024],
    ]) {
      expect(I(x, a, b)).toBeCloseTo(1 - I(1 - x, b, a), 12);
    }
  });

  it('is 0 at x <= 0 and 1 at x >= 1, and rejects bad shapes', () => {
    expect(I(0, 2, 3)).toBe(0);
    expect(I(1, 2, 3)).toBe(1);
    expect(() => I(0.5, 0, 1)).toThrow(RangeError);
  });
});

describe('Beta quantiles', () => {
  it("reproduces Student's t critical values (NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.6.7.2, 3 decimals)", () => {
    // One-sided upper tail alpha: I_{nu/(nu+t^2)}(nu/2, 1/2) = 2 alpha (t distribution in terms of the
    // incomplete beta function, Abramowitz & Stegun 1964, 26.7.1 and 26.5.27; numbers from memory).
    const table: [nu: number, alpha: number, t: number][] = [
      [10, 0.05, 1.812],
      [10, 0.025, 2.228],
      [5, 0.01, 3.365],
      [20, 0.005, 2.845],
      [1, 0.025, 12.706],
      [30, 0.05, 1.697],
    ];
    for (const [nu, alpha, t] of table) {
      const x = betaQuantile(2 * alpha, nu / 2, 0.5);
      expect(Math.abs(Math.sqrt((nu * (1 - x)) / x) - t)).toBeLessThan(0.0006);
    }
  });

  it('reproduces upper 5 % points of the F distribution (NIST/SEMATECH e-Handbook, 1.3.6.7.3, 3 decimals)', () => {
    // P(F <= f) = I_{n1 f / (n1 f + n2)}(n1/2, n2/2) (Abramowitz & Stegun 1964, 26.6.2; number from memory).
    const table: [n1: number, n2: number, f: number][] = [
      [1, 10, 4.965],
      [2, 10, 4.103],
      [3, 12, 3.49],
      [5, 10, 3.326],
      [10, 20, 2.348],
    ];
    for (const [n1, n2, f] of table) {
      const x = betaQuantile(0.95, n1 / 2, n2 / 2);
      expect(Math.abs((n2 * x) / (n1 * (1 - x)) - f)).toBeLessThan(0.0006);
    }
  });

  it('matches a reference library (values computed with SciPy 1.17.1, scipy.stats.beta.ppf, on this machine)', () => {
    const scipy: [p: number, a: number, b: number, q: number][] = [
      [0.05, 5, 3, 0.341261436155336],
      [0.95, 5, 3, 0.8712436071957572],
      [0.3, 0.5, 0.5, 0.2061073738537634],
      [0.05, 2.5, 40.5, 0.013790663333097839],
      [0.95, 2.5, 40.5, 0.1256131675453044],
      [0.05, 1200.5, 48800.5, 0.022894420623716636],
      [0.95, 1200.5, 48800.5, 0.025146266489258457],
      [0.5, 0.2, 0.3, 0.23913503614798193],
      [0.1, 30, 0.7, 0.9428364733012391],
    ];
    for (const [p, a, b, q] of scipy) expect(Math.abs(betaQuantile(p, a, b) - q) / q).toBeLessThan(1e-9);
  });

  it('inverts I_x exactly across shapes from 0.05 to 50,000 (round trip; property test)', () => {
    const shape = fc.double({ min: Math.log(0.05), max: Math.log(50_000), noNaN: true }).map(Math.exp);
    fc.assert(
      fc.property(shape, shape, fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }), (a, b, p) => {
        const x = betaQuantile(p, a, b);
        expect(x).toBeGreaterThanOrEqual(0);
        expect(x).toBeLessThanOrEqual(1);
        // Either I(x) is p to 1e-10, or the CDF is so steep that x is right to a few units in the last
        // place: p lies between I at x -/+ 4 ulp (a round trip cannot do better than the slope allows).
        const ulp = Math.max(Number.EPSILON * x, Number.MIN_VALUE);
        const close = Math.abs(I(x, a, b) - p) < 1e-10;
        const bracketed = I(Math.max(0, x - 4 * ulp), a, b) <= p + 1e-12 && I(Math.min(1, x + 4 * ulp), a, b) >= p - 1e-12;
        expect(close || bracketed).toBe(true);
      }),
      { numRuns: 1000, seed: 20261201 },
    );
  }, 30_000);

  it('gives the equal-tailed interval and the end points 0 and 1', () => {
    const [lo, hi] = betaInterval(5, 3, 0.9);
    expect(I(lo, 5, 3)).toBeCloseTo(0.05, 12);
    expect(I(hi, 5, 3)).toBeCloseTo(0.95, 12);
    expect(betaQuantile(0, 2, 2)).toBe(0);
    expect(betaQuantile(1, 2, 2)).toBe(1);
    expect(() => betaQuantile(1.5, 2, 2)).toThrow(RangeError);
    expect(() => betaInterval(2, 2, 1)).toThrow(RangeError);
  });
});
