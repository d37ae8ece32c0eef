import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  isJetInputError,
  roundToKit,
  scaleJet,
  suggestJets,
  type JetAir,
  type JetNumberScaling,
  type JetSuggestionRequest,
} from './jet-suggestion.js';

/**
 * Carburettor metering, written here independently of the production code (Heywood, Internal
 * Combustion Engine Fundamentals, 1988, ch. 7): the throat depression dp = rho_a V^2 / 2
 * (Bernoulli, incompressible) drives both flows, m_a = Cd_a A_t sqrt(2 rho_a dp) and
 * m_f = Cd_f A_j sqrt(2 rho_f dp). The mixture is fuel per unit of the air that burns it: all of
 * the (moist) air, or only its dry part (mass share rho_d / rho_a) when humidity is counted.
 * A jet's flow area follows its number: area = pi/4 (k n)^2 for diameter-numbered jets, k n for
 * flow-numbered ones (k an arbitrary calibration constant).
 */
interface Carb {
  cdAir: number;
  cdFuel: number;
  throatAreaM2: number;
  fuelDensity: number;
  k: number;
}
function jetArea(n: number, scaling: JetNumberScaling, k: number): number {
  return scaling === 'diameter' ? (Math.PI / 4) * (k * n) ** 2 : k * n;
}
function fuelPerAir(jetNumber: number, scaling: JetNumberScaling, air: JetAir, throatVelocity: number, carb: Carb, countHumidity: boolean): number {
  const dp = 0.5 * air.densityKgM3 * throatVelocity ** 2;
  const mAir = carb.cdAir * carb.throatAreaM2 * Math.sqrt(2 * air.densityKgM3 * dp);
  const mBurning = countHumidity ? (mAir * (air.dryAirDensityKgM3 as number)) / air.densityKgM3 : mAir;
  const mFuel = carb.cdFuel * jetArea(jetNumber, scaling, carb.k) * Math.sqrt(2 * carb.fuelDensity * dp);
  return mFuel / mBurning;
}

const density = fc.double({ min: 0.85, max: 1.45, noNaN: true });
const dryShare = fc.double({ min: 0.95, max: 1, noNaN: true });
const carb = fc.record({
  cdAir: fc.double({ min: 0.6, max: 0.99, noNaN: true }),
  cdFuel: fc.double({ min: 0.5, max: 0.9, noNaN: true }),
  throatAreaM2: fc.double({ min: 3e-4, max: 1.5e-3, noNaN: true }),
  fuelDensity: fc.double({ min: 700, max: 780, noNaN: true }),
  k: fc.double({ min: 1e-6, max: 1e-4, noNaN: true }),
});
const velocity = fc.double({ min: 1, max: 250, noNaN: true });
const scaling = fc.constantFrom<JetNumberScaling>('diameter', 'flow');
const mainJet = fc.double({ min: 60, max: 250, noNaN: true });

const base = (over: Partial<JetSuggestionRequest> = {}): JetSuggestionRequest => ({
  baseline: { mainJet: 125, pilotJet: 40, densityKgM3: 1.2, airScrewTurnsOut: 1.5 },
  today: { densityKgM3: 1.2 },
  scaling: 'diameter',
  ...over,
});

describe('the jet law (property)', () => {
  it('keeps the fuel/air ratio of the baseline at any throat velocity on either day (moist air)', () => {
    // Heywood (1988) ch. 7 metering equations, model above.
    fc.assert(
      fc.property(mainJet, density, density, velocity, velocity, carb, scaling, (n0, rhoBase, rhoToday, vBase, vToday, c, sc) => {
        const b: JetAir = { densityKgM3: rhoBase };
        const t: JetAir = { densityKgM3: rhoToday };
        const s = suggestJets({ baseline: { ...b, mainJet: n0 }, today: t, scaling: sc, mainJetSizes: { step: 2.5 } });
        const before = fuelPerAir(n0, sc, b, vBase, c, false);
        const after = fuelPerAir(s.main.unrounded, sc, t, vToday, c, false);
        expect(Math.abs(after / before - 1)).toBeLessThan(1e-9);
      }),
    );
  });

  it('keeps the fuel per dry air when both days carry a dry-air density', () => {
    // Heywood (1988) ch. 7 for the flows; the dry-air mass share rho_d / rho_a (CIPM-2007 partial densities).
    fc.assert(
      fc.property(mainJet, density, density, dryShare, dryShare, velocity, velocity, carb, scaling, (n0, rb, rt, sb, st, vb, vt, c, sc) => {
        const b: JetAir = { densityKgM3: rb, dryAirDensityKgM3: rb * sb };
        const t: JetAir = { densityKgM3: rt, dryAirDensityKgM3: rt * st };
        const unrounded = scaleJet(n0, b, t, sc);
        expect(Math.abs(fuelPerAir(unrounded, sc, t, vt, c, true) / fuelPerAir(n0, sc, b, vb, c, true) - 1)).toBeLessThan(1e-9);
        expect(suggestJets({ baseline: { ...b, mainJet: n0 }, today: t, scaling: sc }).basis).toBe('dry-air');
      }),
    );
  });

  it('without a change of jet, thinner air richens and denser air leans (the reason to re-jet)', () => {
    // Heywood (1988) ch. 7: F ~ sqrt(rho_f / rho_a) for a fixed jet.
    fc.assert(
      fc.property(mainJet, density, density, velocity, carb, scaling, (n0, rb, rt, v, c, sc) => {
        fc.pre(Math.abs(rt / rb - 1) > 1e-6);
        const before = fuelPerAir(n0, sc, { densityKgM3: rb }, v, c, false);
        const same = fuelPerAir(n0, sc, { densityKgM3: rt }, v, c, false);
        expect(same > before).toBe(rt < rb);
      }),
    );
  });
});

describe('scaling of jet numbers', () => {
  it('diameter-numbered jets scale with rho^(1/4), flow-numbered with rho^(1/2)', () => {
    // Area ~ diameter^2 (geometry); area ~ sqrt(rho) (Heywood 1988, ch. 7). 0.9^0.5 = 0.948683, 0.9^0.25 = 0.974004.
    const b = { densityKgM3: 1.2 };
    const t = { densityKgM3: 1.08 };
    expect(scaleJet(100, b, t, 'flow')).toBeCloseTo(94.8683, 3);
    expect(scaleJet(100, b, t, 'diameter')).toBeCloseTo(97.4004, 3);
  });

  it('humid air at the same total density needs a smaller jet (less oxygen)', () => {
    // Physics: water vapour displaces oxygen-carrying dry air; fuel per dry air rises if the jet is kept.
    const b = { densityKgM3: 1.2, dryAirDensityKgM3: 1.195 };
    const t = { densityKgM3: 1.2, dryAirDensityKgM3: 1.18 };
    expect(scaleJet(125, b, t, 'flow')).toBeLessThan(125);
  });
});

describe('rounding to the kit', () => {
  it('rounds to the nearest step from the baseline and returns the unrounded value', () => {
    expect(roundToKit(123.4, 125, { step: 2.5 })).toMatchObject({ unrounded: 123.4, suggested: 122.5, steps: -1 });
    expect(roundToKit(123.9, 125, { step: 2.5 })).toMatchObject({ suggested: 125, steps: 0 });
    expect(roundToKit(131.0, 125, { step: 5 })).toMatchObject({ suggested: 130, steps: 1 });
    // A tie goes to the larger (richer) size: richer is the safer side (common practice, no published source).
    expect(roundToKit(126.25, 125, { step: 2.5 })).toMatchObject({ suggested: 127.5, steps: 1 });
    expect(roundToKit(123.75, 125, { step: 2.5 })).toMatchObject({ suggested: 125, steps: 0 });
  });

  it('rounds to an explicit list, counts kit sizes as steps and flags a suggestion beyond the kit', () => {
    const kit = { sizes: [35, 37.5, 40, 42.5, 45] };
    expect(roundToKit(38.6, 42.5, kit)).toMatchObject({ suggested: 37.5, steps: -2, beyondKit: false });
    expect(roundToKit(38.75, 42.5, kit)).toMatchObject({ suggested: 40, steps: -1 });
    expect(roundToKit(49, 42.5, kit)).toMatchObject({ suggested: 45, steps: 1, beyondKit: true });
    // The baseline jet is held even when the list leaves it out.
    expect(roundToKit(41, 41, { sizes: [40, 42.5] })).toMatchObject({ suggested: 41, steps: 0 });
  });
});

describe('suggestJets', () => {
  it('suggests a richer main jet for denser air and a leaner one for thinner air', () => {
    // Heywood (1988) ch. 7 (denser air leans a fixed jet, so it needs a bigger one).
    const denser = suggestJets(base({ today: { densityKgM3: 1.26 } }));
    expect(denser.main.unrounded).toBeGreaterThan(125);
    expect(denser.main.change).toBe('richer');
    expect(denser.densityChangePct).toBeCloseTo(5, 10);
    const thinner = suggestJets(base({ today: { densityKgM3: 1.14 } }));
    expect(thinner.main.unrounded).toBeLessThan(125);
    expect(thinner.main.change).toBe('leaner');
  });

  it('puts the fuel-handling caution first and explains itself', () => {
    const s = suggestJets(base({ today: { densityKgM3: 1.19 } }));
    expect(s.cautions[0].code).toBe('fuel-handling');
    expect(s.reasoning.some((r) => r.includes('Heywood'))).toBe(true);
    expect(s.reasoning.some((r) => r.includes('unrounded'))).toBe(true);
  });

  it('adds a lean-seizure caution whenever the main goes more than one size leaner (property)', () => {
    // Product rule: never more than one main-jet size leaner without the caution.
    fc.assert(
      fc.property(mainJet, density, density, scaling, fc.constantFrom(1, 2.5, 5), (n0, rb, rt, sc, step) => {
        const s = suggestJets({ baseline: { mainJet: n0, densityKgM3: rb }, today: { densityKgM3: rt }, scaling: sc, mainJetSizes: { step } });
        const lean = s.cautions.find((c) => c.code === 'lean-seizure');
        if (s.main.steps < -1) {
          expect(lean).toBeDefined();
          expect(lean?.text).toMatch(/seize/);
          expect(lean?.text).toMatch(/qualified engine builder/);
        } else {
          expect(lean).toBeUndefined();
        }
      }),
    );
  });

  it('makes the lean caution a stop when the air is also far outside the logged days', () => {
    // 1.20 -> 1.08 kg/m3 (10 % thinner): flow-numbered 125 -> 118.6, i.e. 3 sizes of 2.5 leaner.
    const s = suggestJets(base({ today: { densityKgM3: 1.08 }, scaling: 'flow' }));
    expect(s.main.steps).toBe(-3);
    expect(s.confidence).toBe('low');
    expect(s.cautions.find((c) => c.code === 'lean-seizure')?.severity).toBe('stop');
    // With logged days that already reach such thin air, it stays a caution.
    const known = suggestJets(base({ today: { densityKgM3: 1.08 }, scaling: 'flow', history: [{ densityKgM3: 1.07 }, { densityKgM3: 1.15 }] }));
    expect(known.confidence).toBe('high');
    expect(known.cautions.find((c) => c.code === 'lean-seizure')?.severity).toBe('caution');
  });

  it('lowers the confidence with the distance outside the logged range', () => {
    const history = [{ densityKgM3: 1.15 }, { densityKgM3: 1.22 }];
    const inside = suggestJets(base({ today: { densityKgM3: 1.18 }, history }));
    expect(inside.loggedRange).toMatchObject({ days: 3, minKgM3: 1.15, maxKgM3: 1.22, position: 'inside', outsideByKgM3: 0 });
    expect(inside.confidence).toBe('high');
    const near = suggestJets(base({ today: { densityKgM3: 1.15 * 0.98 }, history }));
    expect(near.loggedRange.position).toBe('thinner');
    expect(near.loggedRange.outsideByPct).toBeCloseTo(2, 9);
    expect(near.confidence).toBe('medium');
    const far = suggestJets(base({ today: { densityKgM3: 1.22 * 1.05 }, history }));
    expect(far.loggedRange.position).toBe('denser');
    expect(far.confidence).toBe('low');
    expect(far.cautions.some((c) => c.code === 'outside-logged-range')).toBe(true);
  });

  it('suggests a quarter turn of the air screw for low-range changes smaller than a pilot size', () => {
    // Common practice, no published source: on an air screw, in = richer, out = leaner.
    // 1.2 -> 1.23 kg/m3 (2.5 % denser), diameter-numbered: pilot 40 -> 40.25, a tenth of a 2.5 step: leave it.
    const tiny = suggestJets(base({ today: { densityKgM3: 1.23 } }));
    expect(tiny.pilot?.suggested).toBe(40);
    expect(tiny.airScrew?.direction).toBe('none');
    // 1.2 -> 1.30 (8.3 % denser): pilot 40 -> 40.81, a third of a step richer: screw in a quarter.
    const denser = suggestJets(base({ today: { densityKgM3: 1.3 } }));
    expect(denser.pilot?.steps).toBe(0);
    expect(denser.airScrew).toMatchObject({ direction: 'in', turns: 0.25, suggestedTurnsOut: 1.25 });
    // 1.2 -> 1.11 (7.5 % thinner): pilot 40 -> 39.23: screw out a quarter (leaner).
    const thinner = suggestJets(base({ today: { densityKgM3: 1.11 } }));
    expect(thinner.airScrew).toMatchObject({ direction: 'out', turns: 0.25, suggestedTurnsOut: 1.75 });
    // A pilot size change covers it; the screw stays at the baseline setting.
    const big = suggestJets(base({ today: { densityKgM3: 1.0 }, scaling: 'flow' }));
    expect(big.pilot?.steps).toBeLessThan(0);
    expect(big.airScrew?.direction).toBe('none');
    // Without a baseline pilot there is no low-range advice.
    expect(suggestJets({ baseline: { mainJet: 125, densityKgM3: 1.2 }, today: { densityKgM3: 1.3 }, scaling: 'flow' }).airScrew).toBeNull();
  });

  it('rounds the pilot to the listed kit sizes', () => {
    const s = suggestJets(base({ today: { densityKgM3: 1.0 }, scaling: 'flow', pilotJetSizes: { sizes: [35, 37.5, 40, 42.5, 45] } }));
    // 40 * sqrt(1.0 / 1.2) = 36.51 -> 37.5 (nearest held size).
    expect(s.pilot?.unrounded).toBeCloseTo(36.515, 3);
    expect(s.pilot?.suggested).toBe(37.5);
  });

  it('throws a JetInputError naming the field for unusable input', () => {
    const field = (r: unknown) => {
      try {
        suggestJets(r as JetSuggestionRequest);
      } catch (e) {
        if (isJetInputError(e)) return e.field;
        throw e;
      }
      return undefined;
    };
    expect(field(base({ today: { densityKgM3: 0 } }))).toBe('today.densityKgM3');
    expect(field(base({ baseline: { mainJet: Number.NaN, densityKgM3: 1.2 } }))).toBe('baseline.mainJet');
    expect(field(base({ mainJetSizes: { step: 0 } }))).toBe('mainJetSizes.step');
    expect(field(base({ pilotJetSizes: { sizes: [] } }))).toBe('pilotJetSizes.sizes');
    expect(field(base({ scaling: 'bore' as JetNumberScaling }))).toBe('scaling');
    expect(field(base({ history: [{ densityKgM3: -1 }] }))).toBe('history.0.densityKgM3');
    expect(field(base({ today: { densityKgM3: 1.1, dryAirDensityKgM3: 1.2 } }))).toBe('today.dryAirDensityKgM3');
  });
});
