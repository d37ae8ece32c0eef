/**
 * Facts of the trade the ranking relies on, as code. Each value is general slide-carburettor and
 * kart practice; none comes from a published standard (the tests beside this file say so).
 * The facts computed from a request (`facts.ts`) use these, so a rule file never repeats a number
 * that belongs here.
 */
import type { NumericRange, ThrottleBand } from '@fuelwright/shared';

/** Air screw: usually set between 1 and 2 turns out from lightly seated. */
export const AIR_SCREW_USUAL_TURNS_OUT = { min: 1, max: 2 } as const satisfies NumericRange;
/** Air screw adjustments are made in quarter turns. */
export const AIR_SCREW_STEP_TURNS = 0.25;

/** Main jets commonly run on an 80 cc two-stroke shifter. */
export const MAIN_JET_USUAL_80CC = { min: 175, max: 190 } as const satisfies NumericRange;
/** Pilot jets commonly run on an 80 cc two-stroke shifter; sizes come in steps of 2.5. */
export const PILOT_JET_USUAL_80CC = { min: 35, max: 40 } as const satisfies NumericRange;
export const PILOT_JET_STEP = 2.5;
/** The jet-size habits above are for engines of about this displacement. */
export const EIGHTY_CC_BAND = { min: 70, max: 90 } as const satisfies NumericRange;

/** Where a value sits against a usual range. */
export type VsUsual = 'below' | 'within' | 'above';

export function vsUsual(value: number, usual: NumericRange): VsUsual {
  if (value < usual.min) return 'below';
  if (value > usual.max) return 'above';
  return 'within';
}

/** A richer or leaner mixture. */
export type MixtureChange = 'richer' | 'leaner';

/**
 * Turning the air screw out admits more air to the pilot circuit and leans the low-to-mid range;
 * turning it in richens it.
 */
export function airScrewEffect(turn: 'out' | 'in'): { mixture: MixtureChange; bands: ThrottleBand[] } {
  return {
    mixture: turn === 'out' ? 'leaner' : 'richer',
    bands: ['closed', 'up-to-quarter', 'quarter-to-three-quarters'],
  };
}

/** The next air screw setting one quarter turn richer (in) or leaner (out), kept within 0..6 turns. */
export function nextAirScrewSetting(turnsOut: number, want: MixtureChange): number {
  const next = want === 'leaner' ? turnsOut + AIR_SCREW_STEP_TURNS : turnsOut - AIR_SCREW_STEP_TURNS;
  return Math.min(6, Math.max(0, Math.round(next / AIR_SCREW_STEP_TURNS) * AIR_SCREW_STEP_TURNS));
}

/**
 * Turning the idle (slide stop) screw in, clockwise, lifts the slide and raises the idle;
 * anticlockwise lowers the slide and the idle.
 */
export function idleScrewEffect(turn: 'clockwise' | 'anticlockwise'): { slide: 'raised' | 'lowered'; idle: 'higher' | 'lower' } {
  return turn === 'clockwise' ? { slide: 'raised', idle: 'higher' } : { slide: 'lowered', idle: 'lower' };
}

/**
 * Racers usually run with no idle (idle screw backed off) so the engine slows predictably off
 * throttle; an idle makes the engine slow down more slowly and carries the kart deeper into
 * the corner.
 */
export const RACING_IDLE_SCREW = 'backed-off' as const;

/** Needle clip grooves are counted from the top of the needle (groove 1 is the top one). */
export const NEEDLE_CLIP_COUNTED_FROM = 'top' as const;

/**
 * Moving the clip to a lower groove (a higher number counted from the top) raises the needle out
 * of the needle jet and richens the 1/4 to 3/4 range; a higher groove (a lower number) leans it.
 */
export function needleClipFor(groove: number, want: MixtureChange): number {
  const next = want === 'richer' ? groove + 1 : groove - 1;
  return Math.min(7, Math.max(1, next));
}

/**
 * The needle's usual clip grooves run from 1 (the top) to 5: groove 1 holds the needle lowest in
 * the needle jet (the leanest mid-range the needle gives), groove 5 and below hold it highest (the
 * richest on a usual five-groove needle).
 */
export const NEEDLE_CLIP_TOP_GROOVE = 1;
export const NEEDLE_CLIP_BOTTOM_GROOVE = 5;

/** Where the clip sits: at the top groove, at or below the usual bottom groove, or between. */
export type NeedleClipEnd = 'top' | 'between' | 'bottom';
export const NEEDLE_CLIP_ENDS: readonly NeedleClipEnd[] = ['top', 'between', 'bottom'];

export function needleClipEnd(groove: number): NeedleClipEnd {
  if (groove <= NEEDLE_CLIP_TOP_GROOVE) return 'top';
  if (groove >= NEEDLE_CLIP_BOTTOM_GROOVE) return 'bottom';
  return 'between';
}

/** Whether a pilot jet size is one of the usual 2.5 steps. */
export function isPilotJetStep(size: number): boolean {
  const steps = size / PILOT_JET_STEP;
  return Math.abs(steps - Math.round(steps)) < 1e-9;
}

/** Which causes the circuit of each throttle band points at first. */
export const BAND_CIRCUIT_CAUSES: Record<ThrottleBand, readonly string[]> = {
  closed: ['pilot-jet-wrong-or-blocked', 'air-screw-too-far-out', 'air-screw-too-far-in'],
  'up-to-quarter': ['slide-cutaway-wrong', 'slide-sticking-or-misfitted'],
  'quarter-to-three-quarters': ['needle-clip-wrong-groove', 'needle-or-clip-worn'],
  'three-quarters-to-full': ['main-jet-too-small', 'main-jet-too-large'],
};

/**
 * Denser air than when the jetting was last right leans the mixture (the jets meter fuel for the
 * air they saw then); thinner air richens it. Returns the direction the mixture moves.
 */
export function densityEffect(densityChangePct: number): MixtureChange | 'unchanged' {
  if (densityChangePct > 0) return 'leaner';
  if (densityChangePct < 0) return 'richer';
  return 'unchanged';
}

// The percent change itself is `densityChangePct(baselineKgM3, todayKgM3)` in @fuelwright/shared
// (air/compute-air.ts): one definition for the rules, the jetting log and the UI.
