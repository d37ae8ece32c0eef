/**
 * Jet suggestion from a baseline (the jets that ran right at a known air density) for today's air.
 * Pure: no I/O.
 *
 * Physics (carburettor metering; J. B. Heywood, Internal Combustion Engine Fundamentals, McGraw-Hill
 * 1988, ch. 7, "the elementary carburetor"): the same depression at the venturi throat, dp, drives
 * the air and the fuel.
 *   air mass flow   m_a = Cd_a A_t sqrt(2 rho_a dp)
 *   fuel mass flow  m_f = Cd_f A_j sqrt(2 rho_f dp)
 *   fuel/air ratio  F = m_f / m_a = (Cd_f A_j / Cd_a A_t) sqrt(rho_f / rho_a)
 * F does not depend on dp (so not on throttle or throat velocity, in this model) but falls as the
 * air gets denser: thinner air richens a fixed jet, denser air leans it. Holding F needs a jet flow
 * area A_j proportional to sqrt(rho_a).
 *
 * Humidity: the oxygen comes with the dry-air part of the flow, a share rho_d / rho_a of the mass, so
 * the fuel per dry air is held when A_j is proportional to rho_d / sqrt(rho_a) = sqrt(rho_d^2 / rho_a).
 * When both days carry a dry-air density this "metering density" rho_d^2 / rho_a is used; otherwise
 * the moist density on both days.
 *
 * Jet numbers: if the number follows the orifice diameter, area ~ number^2 and the number scales
 * with rho^(1/4); if the number follows flow, it scales with rho^(1/2). The user says which.
 *
 * Not modelled: the float-level head (which makes the mixture lean at the lowest airflow), air
 * compressibility in the venturi, fuel temperature and the needle/slide circuit.
 */

export type JetNumberScaling = 'diameter' | 'flow';

/** The sizes a jet kit holds: every `step` from the baseline jet, or an explicit list. */
export type JetSizeSet = { step: number } | { sizes: readonly number[] };

/** Air on one day. `dryAirDensityKgM3` (the dry-air partial density) lets humidity count. */
export interface JetAir {
  densityKgM3: number;
  dryAirDensityKgM3?: number;
}

export interface JetBaseline extends JetAir {
  mainJet: number;
  pilotJet?: number;
  /** Air screw, turns out from lightly seated, on the baseline day. */
  airScrewTurnsOut?: number;
}

/** A logged day on which the kart ran right. */
export interface JetHistoryDay {
  densityKgM3: number;
  date?: string;
}

export interface JetSuggestionRequest {
  baseline: JetBaseline;
  today: JetAir;
  scaling: JetNumberScaling;
  /** Default: every 2.5 from the baseline main jet. */
  mainJetSizes?: JetSizeSet;
  /** Default: every 2.5 from the baseline pilot jet. */
  pilotJetSizes?: JetSizeSet;
  /** Other days that ran right (the baseline day counts too). */
  history?: readonly JetHistoryDay[];
}

export interface JetChoice {
  baseline: number;
  /** The exact number the metering law asks for. */
  unrounded: number;
  /** The nearest size held (the richer one on a tie), limited to the kit's range. */
  suggested: number;
  /** Kit sizes from the baseline to the suggestion: negative = leaner. */
  steps: number;
  change: 'richer' | 'leaner' | 'same';
  /** True when the law asks for a size beyond the smallest or largest held. */
  beyondKit: boolean;
}

export interface AirScrewAdvice {
  direction: 'in' | 'out' | 'none';
  /** Turns to make in `direction` (0 or 0.25). */
  turns: number;
  /** Baseline turns out adjusted by the advice, when the baseline setting is known. */
  suggestedTurnsOut: number | null;
  text: string;
}

export interface LoggedRange {
  /** Days in the range: the baseline plus the history. */
  days: number;
  minKgM3: number;
  maxKgM3: number;
  position: 'inside' | 'denser' | 'thinner';
  /** How far today is beyond the nearest end of the range (0 inside). */
  outsideByKgM3: number;
  outsideByPct: number;
}

export type JetConfidence = 'high' | 'medium' | 'low';
export type JetCautionSeverity = 'caution' | 'stop';

export interface JetCaution {
  code: 'fuel-handling' | 'lean-seizure' | 'outside-logged-range';
  severity: JetCautionSeverity;
  text: string;
}

export interface JetSuggestion {
  /** Which density the law used: dry-air (humidity counted) or moist-air. */
  basis: 'dry-air' | 'moist-air';
  /** Today's metering density over the baseline's. */
  meteringDensityRatio: number;
  /** Jet flow area needed today over the baseline's: sqrt(meteringDensityRatio). */
  jetAreaRatio: number;
  /** Jet number today over the baseline's, for the chosen scaling. */
  jetNumberRatio: number;
  /** Change in (moist) air density, % of the baseline; positive = denser today. */
  densityChangePct: number;
  main: JetChoice;
  pilot: JetChoice | null;
  airScrew: AirScrewAdvice | null;
  loggedRange: LoggedRange;
  confidence: JetConfidence;
  /** Usual cautions first, then the ones this suggestion raises. */
  cautions: JetCaution[];
  /** The reasoning in plain words, in order. */
  reasoning: string[];
}

/** Thrown for input that cannot be used; `field` names it (dotted path). */
export class JetInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(message);
    this.name = 'JetInputError';
    this.field = field;
  }
}

export function isJetInputError(e: unknown): e is JetInputError {
  return e instanceof JetInputError || (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'JetInputError');
}

/** Within this distance (% beyond the logged range) the confidence stays high; product choice, no published source. */
export const CONFIDENCE_HIGH_WITHIN_PCT = 1;
/** Beyond this distance the confidence is low; product choice, no published source. */
export const CONFIDENCE_LOW_BEYOND_PCT = 3;
/** Share of a pilot-jet step from which a quarter turn of the air screw is suggested; common practice, no published source. */
export const AIR_SCREW_THRESHOLD_STEP_SHARE = 0.25;
export const DEFAULT_JET_STEP = 2.5;

// ---------------------------------------------------------------------------------------------
// The law

/** Density that sets the metering: rho_d^2 / rho_a when the dry-air density is known, else rho_a. */
export function meteringDensity(air: JetAir, useDryAir: boolean): number {
  if (useDryAir && air.dryAirDensityKgM3 !== undefined) return (air.dryAirDensityKgM3 * air.dryAirDensityKgM3) / air.densityKgM3;
  return air.densityKgM3;
}

/** Jet number ratio for a metering-density ratio: rho^(1/4) for diameter-numbered jets, rho^(1/2) for flow-numbered. */
export function jetNumberRatioFor(meteringDensityRatio: number, scaling: JetNumberScaling): number {
  const areaRatio = Math.sqrt(meteringDensityRatio);
  return scaling === 'diameter' ? Math.sqrt(areaRatio) : areaRatio;
}

/** The unrounded jet number that holds the mixture of `baselineJet` at `baselineAir` in `todayAir`. */
export function scaleJet(baselineJet: number, baselineAir: JetAir, todayAir: JetAir, scaling: JetNumberScaling): number {
  const useDry = baselineAir.dryAirDensityKgM3 !== undefined && todayAir.dryAirDensityKgM3 !== undefined;
  return baselineJet * jetNumberRatioFor(meteringDensity(todayAir, useDry) / meteringDensity(baselineAir, useDry), scaling);
}

// ---------------------------------------------------------------------------------------------
// Kit sizes

const tidy = (x: number) => Math.round(x * 1e6) / 1e6;

function heldSizes(set: JetSizeSet, baseline: number): number[] | null {
  if ('sizes' in set) return [...new Set([...set.sizes, baseline])].sort((a, b) => a - b);
  return null;
}

/** Round to the nearest held size (ties to the larger, richer one) and count steps from the baseline. */
export function roundToKit(unrounded: number, baseline: number, set: JetSizeSet): Omit<JetChoice, 'change'> {
  const list = heldSizes(set, baseline);
  if (list === null) {
    const step = (set as { step: number }).step;
    const k = Math.round((unrounded - baseline) / step) + 0; // halves go up (richer); + 0 turns -0 into 0
    const suggested = tidy(baseline + k * step);
    return { baseline, unrounded, suggested, steps: k, beyondKit: suggested <= 0 };
  }
  let best = list[0];
  for (const s of list) {
    const d = Math.abs(s - unrounded);
    const bd = Math.abs(best - unrounded);
    if (d < bd - 1e-12 || (Math.abs(d - bd) <= 1e-12 && s > best)) best = s;
  }
  const steps = list.indexOf(best) - list.indexOf(baseline);
  const beyondKit = unrounded < list[0] - 1e-9 || unrounded > list[list.length - 1] + 1e-9;
  return { baseline, unrounded, suggested: best, steps, beyondKit };
}

/** Distance from the baseline size to the neighbouring held size on the side of `direction`. */
function neighbourGap(baseline: number, set: JetSizeSet, direction: 1 | -1): number | null {
  const list = heldSizes(set, baseline);
  if (list === null) return (set as { step: number }).step;
  const i = list.indexOf(baseline) + direction;
  if (i < 0 || i >= list.length) return null;
  return Math.abs(list[i] - baseline);
}

// ---------------------------------------------------------------------------------------------
// Validation

function positive(field: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) throw new JetInputError(field, `${field} must be a finite number above 0.`);
  return v;
}

function validateAir(prefix: string, air: JetAir): void {
  if (typeof air !== 'object' || air === null) throw new JetInputError(prefix, `${prefix} is required.`);
  positive(`${prefix}.densityKgM3`, air.densityKgM3);
  if (air.dryAirDensityKgM3 !== undefined) {
    positive(`${prefix}.dryAirDensityKgM3`, air.dryAirDensityKgM3);
    if (air.dryAirDensityKgM3 > air.densityKgM3 * (1 + 1e-12)) {
      throw new JetInputError(`${prefix}.dryAirDensityKgM3`, `${prefix}.dryAirDensityKgM3 cannot exceed ${prefix}.densityKgM3.`);
    }
  }
}

function validateSizes(field: string, set: JetSizeSet): void {
  if (typeof set !== 'object' || set === null) throw new JetInputError(field, `${field} must be { step } or { sizes }.`);
  if ('sizes' in set) {
    if (!Array.isArray(set.sizes) || set.sizes.length === 0) throw new JetInputError(`${field}.sizes`, `${field}.sizes must list at least one size.`);
    set.sizes.forEach((s, i) => positive(`${field}.sizes.${i}`, s));
  } else {
    positive(`${field}.step`, (set as { step: unknown }).step);
  }
}

// ---------------------------------------------------------------------------------------------
// Wording helpers

const f3 = (x: number) => x.toFixed(3);
const f1 = (x: number) => x.toFixed(1);
const jet = (x: number) => String(tidy(x));
const jetUnrounded = (x: number) => x.toFixed(2);
const sizes = (n: number) => `${Math.abs(n)} size${Math.abs(n) === 1 ? '' : 's'}`;

function describeChoice(name: string, c: JetChoice): string {
  const move = c.steps === 0 ? 'the same size as the baseline' : `${sizes(c.steps)} ${c.steps < 0 ? 'leaner' : 'richer'} than the baseline`;
  const kit = c.beyondKit ? ' The law asks for a size beyond the ones you hold, so this is the nearest end of your kit.' : '';
  return `${name} jet: ${jet(c.baseline)} on the baseline day becomes ${jetUnrounded(c.unrounded)} unrounded; the nearest size you hold is ${jet(c.suggested)}, ${move}.${kit}`;
}

function changeOf(c: Omit<JetChoice, 'change'>): JetChoice['change'] {
  return c.steps > 0 ? 'richer' : c.steps < 0 ? 'leaner' : 'same';
}

// ---------------------------------------------------------------------------------------------

/** Suggest today's main and pilot jets (and air screw) from a baseline. Throws `JetInputError` on unusable input. */
export function suggestJets(request: JetSuggestionRequest): JetSuggestion {
  if (typeof request !== 'object' || request === null) throw new JetInputError('request', 'A request is required.');
  const { baseline, today } = request;
  validateAir('baseline', baseline);
  validateAir('today', today);
  positive('baseline.mainJet', baseline.mainJet);
  if (baseline.pilotJet !== undefined) positive('baseline.pilotJet', baseline.pilotJet);
  if (baseline.airScrewTurnsOut !== undefined) {
    const t = baseline.airScrewTurnsOut;
    if (typeof t !== 'number' || !Number.isFinite(t) || t < 0) throw new JetInputError('baseline.airScrewTurnsOut', 'baseline.airScrewTurnsOut must be 0 or more.');
  }
  if (request.scaling !== 'diameter' && request.scaling !== 'flow') {
    throw new JetInputError('scaling', "scaling must be 'diameter' or 'flow'.");
  }
  const mainSet: JetSizeSet = request.mainJetSizes ?? { step: DEFAULT_JET_STEP };
  const pilotSet: JetSizeSet = request.pilotJetSizes ?? { step: DEFAULT_JET_STEP };
  validateSizes('mainJetSizes', mainSet);
  validateSizes('pilotJetSizes', pilotSet);
  const history = request.history ?? [];
  if (!Array.isArray(history)) throw new JetInputError('history', 'history must be a list.');
  history.forEach((d, i) => positive(`history.${i}.densityKgM3`, d?.densityKgM3));

  const reasoning: string[] = [];
  const cautions: JetCaution[] = [
    {
      code: 'fuel-handling',
      severity: 'caution',
      text:
        'Change jets only with the engine off and cool, away from sparks and flames, with the fuel shut off; wipe up spilled fuel and check for leaks before starting. Follow your track rules and technical inspection.',
    },
  ];

  // 1. The air.
  const useDry = baseline.dryAirDensityKgM3 !== undefined && today.dryAirDensityKgM3 !== undefined;
  const rhoRatio = meteringDensity(today, useDry) / meteringDensity(baseline, useDry);
  const areaRatio = Math.sqrt(rhoRatio);
  const numberRatio = jetNumberRatioFor(rhoRatio, request.scaling);
  const changePct = (100 * (today.densityKgM3 - baseline.densityKgM3)) / baseline.densityKgM3;

  const word = changePct > 0 ? 'denser' : changePct < 0 ? 'thinner' : 'as dense as';
  reasoning.push(
    changePct === 0
      ? `Today's air is as dense as on the baseline day (${f3(today.densityKgM3)} kg/m3).`
      : `Today's air is ${f1(Math.abs(changePct))} % ${word} than on the baseline day (${f3(today.densityKgM3)} against ${f3(baseline.densityKgM3)} kg/m3).`,
  );
  reasoning.push(
    'In a carburettor the same pressure drop at the venturi pulls air through the throat and fuel through the jet. The air flow grows with the square root of the air density while the fuel flow does not, so thinner air makes a fixed jet run richer and denser air makes it run leaner (Heywood, Internal Combustion Engine Fundamentals, 1988, ch. 7).',
  );
  reasoning.push(
    useDry
      ? 'Humidity is counted: the oxygen comes with the dry part of the air, so the law uses the dry-air density of both days (the jet area follows dry density over the square root of total density).'
      : 'Humidity is not counted separately: the total (moist) air density of both days is used. Give the dry-air density of both days to count it.',
  );
  reasoning.push(`To keep the same mixture the jet's flow area must change by the square root of that density ratio: x${areaRatio.toFixed(4)}.`);
  reasoning.push(
    request.scaling === 'diameter'
      ? `Your jet numbers follow the hole diameter, so the number changes by the square root of that: x${numberRatio.toFixed(4)}.`
      : `Your jet numbers follow flow, so the number changes by the same factor: x${numberRatio.toFixed(4)}.`,
  );

  // 2. The jets.
  const mainRounded = roundToKit(baseline.mainJet * numberRatio, baseline.mainJet, mainSet);
  const main: JetChoice = { ...mainRounded, change: changeOf(mainRounded) };
  reasoning.push(describeChoice('Main', main));

  let pilot: JetChoice | null = null;
  if (baseline.pilotJet !== undefined) {
    const p = roundToKit(baseline.pilotJet * numberRatio, baseline.pilotJet, pilotSet);
    pilot = { ...p, change: changeOf(p) };
    reasoning.push(describeChoice('Pilot', pilot));
  }

  // 3. The air screw, for changes in the low range too small for a pilot size.
  let airScrew: AirScrewAdvice | null = null;
  if (pilot === null) {
    reasoning.push('No baseline pilot jet was given, so there is no low-range advice.');
  } else {
    const turnsOutBase = baseline.airScrewTurnsOut ?? null;
    const needRicher = pilot.unrounded > pilot.baseline;
    const gap = neighbourGap(pilot.baseline, pilotSet, needRicher ? 1 : -1);
    const share = gap === null ? 0 : Math.abs(pilot.unrounded - pilot.baseline) / gap;
    const note =
      'On these carburettors the low-speed screw meters air: in (clockwise) is richer, out is leaner. If yours meters fuel instead, the directions are reversed.';
    if (pilot.steps !== 0) {
      airScrew = {
        direction: 'none',
        turns: 0,
        suggestedTurnsOut: turnsOutBase,
        text: `The pilot jet change covers the low range; start with the air screw where it was on the baseline day. ${note}`,
      };
    } else if (share >= AIR_SCREW_THRESHOLD_STEP_SHARE) {
      const direction = needRicher ? 'in' : 'out';
      const suggestedTurnsOut = turnsOutBase === null ? null : Math.max(0, turnsOutBase + (needRicher ? -0.25 : 0.25));
      airScrew = {
        direction,
        turns: 0.25,
        suggestedTurnsOut,
        text: needRicher
          ? `Denser air leans the low range a little, less than one pilot size: turn the air screw in a quarter turn to richen it${suggestedTurnsOut === null ? '' : ` (to ${suggestedTurnsOut} turns out)`}. ${note}`
          : `Thinner air richens the low range a little, less than one pilot size: turn the air screw out a quarter turn to lean it${suggestedTurnsOut === null ? '' : ` (to ${suggestedTurnsOut} turns out)`}. ${note}`,
      };
    } else {
      airScrew = {
        direction: 'none',
        turns: 0,
        suggestedTurnsOut: turnsOutBase,
        text: `The low-range change is too small to act on; leave the air screw where it was on the baseline day. ${note}`,
      };
    }
    reasoning.push(airScrew.text);
  }

  // 4. How far today is from the days that ran right.
  const logged = [baseline.densityKgM3, ...history.map((d) => d.densityKgM3)];
  const minKgM3 = Math.min(...logged);
  const maxKgM3 = Math.max(...logged);
  const position: LoggedRange['position'] = today.densityKgM3 > maxKgM3 ? 'denser' : today.densityKgM3 < minKgM3 ? 'thinner' : 'inside';
  const outsideByKgM3 = position === 'denser' ? today.densityKgM3 - maxKgM3 : position === 'thinner' ? minKgM3 - today.densityKgM3 : 0;
  const outsideByPct = position === 'denser' ? (100 * outsideByKgM3) / maxKgM3 : position === 'thinner' ? (100 * outsideByKgM3) / minKgM3 : 0;
  const loggedRange: LoggedRange = { days: logged.length, minKgM3, maxKgM3, position, outsideByKgM3, outsideByPct };
  const confidence: JetConfidence =
    outsideByPct <= CONFIDENCE_HIGH_WITHIN_PCT ? 'high' : outsideByPct <= CONFIDENCE_LOW_BEYOND_PCT ? 'medium' : 'low';
  const daysText = `${logged.length} logged day${logged.length === 1 ? '' : 's'} that ran right (${f3(minKgM3)} to ${f3(maxKgM3)} kg/m3)`;
  reasoning.push(
    position === 'inside'
      ? `Today is inside the range of your ${daysText}: confidence ${confidence}.`
      : `Today's air is ${f1(outsideByPct)} % ${position} than any of your ${daysText}: confidence ${confidence}. The further outside your own history, the more the other things that change with the weather matter.`,
  );

  // 5. Cautions where the suggestion leans out or leaves the logged range.
  const leanSteps = Math.min(main.steps, pilot?.steps ?? 0);
  if (leanSteps < -1) {
    const which = main.steps < -1 && pilot !== null && pilot.steps < -1 ? 'main and pilot jets' : main.steps < -1 ? 'main jet' : 'pilot jet';
    const stop = confidence === 'low';
    cautions.push({
      code: 'lean-seizure',
      severity: stop ? 'stop' : 'caution',
      text: stop
        ? `The suggested ${which} ${which.endsWith('s') ? 'are' : 'is'} ${sizes(leanSteps)} leaner than what ran right, and today's air is far outside your logged days. Do not run this leaner setting on the strength of this suggestion alone: a lean engine can seize without warning. Check with a qualified engine builder first.`
        : `The suggested ${which} ${which.endsWith('s') ? 'are' : 'is'} ${sizes(leanSteps)} leaner than what ran right. A lean engine can seize without warning: go leaner one size at a time with short runs, read the plug and piston crown, and ask a qualified engine builder before running leaner than you have before.`,
    });
    reasoning.push('Going more than one size leaner than what ran right risks a lean seizure; see the caution.');
  } else if (confidence === 'low') {
    cautions.push({
      code: 'outside-logged-range',
      severity: 'caution',
      text: 'Today is well outside the air you have logged, so the suggestion is an extrapolation. If unsure, stay one size rich, make a short run and read the plug; a qualified engine builder can confirm.',
    });
  }

  reasoning.push(
    'This assumes the engine, fuel, oil ratio, needle and float or pump-around setup are unchanged since the baseline day. Make a short run and read the plug before trusting it.',
  );

  return {
    basis: useDry ? 'dry-air' : 'moist-air',
    meteringDensityRatio: rhoRatio,
    jetAreaRatio: areaRatio,
    jetNumberRatio: numberRatio,
    densityChangePct: changePct,
    main,
    pilot,
    airScrew,
    loggedRange,
    confidence,
    cautions,
    reasoning,
  };
}
