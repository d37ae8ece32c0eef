/**
 * The conjugate updates against small cases worked out by hand (the arithmetic is written out
 * beside each check), the truncation EM against data whose answer is known by construction, and
 * the Monte Carlo interval against the delta method and Beta moments.
 */
import { describe, expect, it } from 'vitest';
import {
  betaCredibleInterval,
  betaMean,
  betaPosterior,
  betaVariance,
  dirichletMarginal,
  dirichletMean,
  dirichletPosterior,
  estimateLikelihoodRatio,
  fitTruncatedDirichlet,
  ratioInterval,
  ratioIntervalDelta,
  MAX_PRIOR_FIRING,
} from './bayes.js';
import { beta as betaDeviate, createRandom } from './random.js';

function betaDeviateMoments(a: number, b: number, n: number, seed: string): { mean: number; variance: number } {
  const random = createRandom(seed);
  let mean = 0;
  let m2 = 0;
  for (let i = 1; i <= n; i++) {
    const x = betaDeviate(random, a, b);
    const d = x - mean;
    mean += d / i;
    m2 += d * (x - mean);
  }
  return { mean, variance: m2 / (n - 1) };
}

describe('Beta update', () => {
  it('Beta(2,2) prior and 3 of 4 outcomes confirming: posterior Beta(5,3), mean 0.625 (by hand: 2+3, 2+1; 5/8)', () => {
    const post = betaPosterior({ alpha: 2, beta: 2 }, 3, 4);
    expect(post).toEqual({ alpha: 5, beta: 3 });
    expect(betaMean(post)).toBe(0.625);
    // Var = ab / ((a+b)^2 (a+b+1)) = 15 / (64 * 9) (moments of the Beta distribution).
    expect(betaVariance(post)).toBeCloseTo(15 / 576, 15);
  });

  it('gives the 90 % interval of Beta(5,3) (SciPy 1.17.1 scipy.stats.beta.ppf: 0.341261436155336, 0.8712436071957572)', () => {
    const [lo, hi] = betaCredibleInterval({ alpha: 5, beta: 3 });
    expect(lo).toBeCloseTo(0.341261436155336, 12);
    expect(hi).toBeCloseTo(0.8712436071957572, 12);
  });

  it('takes fractional counts and rejects impossible ones', () => {
    expect(betaPosterior({ alpha: 1, beta: 1 }, 0.5, 1.5)).toEqual({ alpha: 1.5, beta: 2 });
    expect(() => betaPosterior({ alpha: 1, beta: 1 }, 3, 2)).toThrow(RangeError);
    expect(() => betaPosterior({ alpha: 1, beta: 1 }, -1, 2)).toThrow(RangeError);
  });
});

describe('Dirichlet update', () => {
  it('Dirichlet(1,2,3) and counts (4,0,2): posterior (5,2,5), means 5/12, 2/12, 5/12; marginal of the first Beta(5,7) (by hand)', () => {
    const post = dirichletPosterior([1, 2, 3], [4, 0, 2]);
    expect(post).toEqual([5, 2, 5]);
    const mean = dirichletMean(post);
    expect(mean[0]).toBeCloseTo(5 / 12, 15);
    expect(mean[1]).toBeCloseTo(2 / 12, 15);
    expect(mean[2]).toBeCloseTo(5 / 12, 15);
    expect(dirichletMarginal(post, 0)).toEqual({ alpha: 5, beta: 7 });
    // SciPy 1.17.1 scipy.stats.beta.ppf(0.05 / 0.95, 5, 7).
    const [lo, hi] = betaCredibleInterval(dirichletMarginal(post, 0));
    expect(lo).toBeCloseTo(0.19957614988383687, 12);
    expect(hi).toBeCloseTo(0.6501884654280824, 12);
  });

  it('rejects mismatched or negative counts', () => {
    expect(() => dirichletPosterior([1, 1], [1])).toThrow(RangeError);
    expect(() => dirichletPosterior([1, 1], [1, -1])).toThrow(RangeError);
  });
});

describe('truncated Dirichlet (causes that cannot occur on some karts)', () => {
  const alpha = [2, 3, 5]; // strength 10 on shares 0.2, 0.3, 0.5
  it('is the plain conjugate update when every category can occur', () => {
    const fit = fitTruncatedDirichlet(alpha, [{ possible: [true, true, true], counts: [4, 2, 4] }]);
    expect(fit.posterior).toEqual([6, 5, 9]);
    expect(fit.mean[0]).toBeCloseTo(0.3, 15);
    expect(fit.imputed).toEqual([0, 0, 0]);
  });

  it('recovers the shares from data drawn exactly from them, where a plain update would not (by construction)', () => {
    // Shares 0.2 / 0.3 / 0.5. Karts where all occur: 100 outcomes -> 20, 30, 50. Karts where the
    // second cannot occur: 70 outcomes -> 0.2/0.7 and 0.5/0.7 of them: 20 and 50.
    const groups = [
      { possible: [true, true, true], counts: [20, 30, 50] },
      { possible: [true, false, true], counts: [20, 0, 50] },
    ];
    const fit = fitTruncatedDirichlet(alpha, groups);
    expect(fit.mean[0]).toBeCloseTo(0.2, 10);
    expect(fit.mean[1]).toBeCloseTo(0.3, 10);
    expect(fit.mean[2]).toBeCloseTo(0.5, 10);
    // The 70 restricted outcomes stand for 100 draws, 30 of which fell on the impossible cause.
    expect(fit.imputed[1]).toBeCloseTo(30, 8);
    expect(fit.observed).toEqual([40, 30, 100]);
    // A plain update would shrink the second share: (3 + 30) / (10 + 170) = 0.1833.
    expect(dirichletMean(dirichletPosterior(alpha, [40, 30, 100]))[1]).toBeCloseTo(33 / 180, 12);
  });
});

describe('likelihood ratio estimate', () => {
  const base = { causeStrength: 4, referenceStrength: 10, pooledOutcomes: 200, pooledFired: 30 };

  it('with no outcomes of the cause it keeps the expert ratio exactly', () => {
    const est = estimateLikelihoodRatio({ ...base, expertLr: 2.5, causeOutcomes: 0, causeFired: 0, referenceOutcomes: 99, referenceFired: 9 });
    expect(est.lr).toBe(2.5);
    expect(est.kept).toBe(true);
    // Even when the prior had to be capped (a rule that fires nearly always cannot have a ratio of 10).
    const capped = estimateLikelihoodRatio({ ...base, expertLr: 10, causeOutcomes: 0, causeFired: 0, referenceOutcomes: 0, referenceFired: 0, pooledOutcomes: 0, pooledFired: 0 });
    expect(capped.capped).toBe(true);
    expect(capped.lr).toBe(10);
  });

  it('works a small case through by hand', () => {
    // f = (30 + 1/2) / (200 + 1); reference prior Beta(10 f, 10 (1 - f)), 9 of 99 fired -> mean b = (10 f + 9) / 109.
    // Cause prior mean m = 2 b at strength 4 -> Beta(4m, 4(1 - m)); 5 of 10 fired -> mean (4m + 5) / 14.
    const f = 30.5 / 201;
    const b = (10 * f + 9) / 109;
    const m = 2 * b;
    const a = (4 * m + 5) / 14;
    const est = estimateLikelihoodRatio({ ...base, expertLr: 2, causeOutcomes: 10, causeFired: 5, referenceOutcomes: 99, referenceFired: 9 });
    expect(est.referencePrior.alpha).toBeCloseTo(10 * f, 12);
    expect(est.ifReference.alpha).toBeCloseTo(10 * f + 9, 12);
    expect(est.ifReference.beta).toBeCloseTo(10 * (1 - f) + 90, 12);
    expect(est.causePrior.alpha).toBeCloseTo(4 * m, 12);
    expect(est.ifCause.alpha).toBeCloseTo(4 * m + 5, 12);
    expect(est.ifCause.beta).toBeCloseTo(4 * (1 - m) + 5, 12);
    expect(est.lr).toBeCloseTo(a / b, 12);
    expect(est.lr).toBeCloseTo(4.2728, 3); // 0.41228 / 0.096490
    expect(est.kept).toBe(false);
  });

  it('tends to the observed ratio of firing rates when outcomes far outweigh the prior', () => {
    const est = estimateLikelihoodRatio({ ...base, expertLr: 5, causeOutcomes: 100_000, causeFired: 30_000, referenceOutcomes: 100_000, referenceFired: 10_000 });
    expect(est.lr).toBeCloseTo(3, 2);
  });

  it('holds the prior mean below 1 when the expert ratio times the base rate reaches it', () => {
    // Pooled 80 of 100 -> f = 80.5 / 101; reference 40 of 50 -> b = (10 f + 40) / 60 = 0.7995; x 4 > 1 -> m = 0.99.
    const est = estimateLikelihoodRatio({ ...base, expertLr: 4, causeOutcomes: 2, causeFired: 2, referenceOutcomes: 50, referenceFired: 40, pooledOutcomes: 100, pooledFired: 80 });
    const b = ((10 * 80.5) / 101 + 40) / 60;
    expect(est.capped).toBe(true);
    expect(betaMean(est.causePrior)).toBeCloseTo(MAX_PRIOR_FIRING, 12);
    expect(est.lr).toBeCloseTo((4 * MAX_PRIOR_FIRING + 2) / 6 / b, 12);
  });

  it('rejects a zero strength or ratio and impossible pooled counts', () => {
    const ok = { ...base, expertLr: 2, causeOutcomes: 1, causeFired: 1, referenceOutcomes: 1, referenceFired: 0 };
    expect(() => estimateLikelihoodRatio({ ...ok, causeStrength: 0 })).toThrow(RangeError);
    expect(() => estimateLikelihoodRatio({ ...ok, expertLr: 0 })).toThrow(RangeError);
    expect(() => estimateLikelihoodRatio({ ...ok, pooledFired: 300 })).toThrow(RangeError);
  });
});

describe('ratio interval', () => {
  const num = { alpha: 300, beta: 700 };
  const den = { alpha: 100, beta: 900 };

  it('is the same for the same seed and differs for another', () => {
    const a = ratioInterval(num, den, { seed: 'r1', draws: 1000 });
    expect(ratioInterval(num, den, { seed: 'r1', draws: 1000 })).toEqual(a);
    expect(ratioInterval(num, den, { seed: 'r2', draws: 1000 })).not.toEqual(a);
  });

  it('agrees with the delta method when counts are large (both approximate the same log-normal; within Monte Carlo error)', () => {
    const [lo, hi] = ratioInterval(num, den, { seed: 7, draws: 20_000 });
    const [dlo, dhi] = ratioIntervalDelta(num, den);
    expect(Math.abs(Math.log(lo / dlo))).toBeLessThan(0.02);
    expect(Math.abs(Math.log(hi / dhi))).toBeLessThan(0.02);
    expect(lo).toBeLessThan(3);
    expect(hi).toBeGreaterThan(3);
  });

  it('draws Beta deviates with the right mean and variance (moments of the Beta distribution; 200,000 draws, 5 standard errors)', () => {
    for (const [a, b] of [
      [0.5, 0.5],
      [2, 5],
      [300.5, 49_700.5],
    ]) {
      const m = betaDeviateMoments(a, b, 200_000, `moments-${a}-${b}`);
      const mean = a / (a + b);
      const variance = (a * b) / ((a + b) ** 2 * (a + b + 1));
      expect(Math.abs(m.mean - mean)).toBeLessThan(5 * Math.sqrt(variance / 200_000));
      expect(Math.abs(m.variance / variance - 1)).toBeLessThan(0.03);
    }
  }, 30_000);
});
