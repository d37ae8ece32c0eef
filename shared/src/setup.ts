/**
 * Setup snapshot contract: the carburettor and fuel settings of one kart on one day, as the racer
 * or the shop records them. Used by karts/setups, by cases, and (all fields optional) by the rank
 * input of POST /api/diagnosis/rank. Also the shared vocabulary for where a symptom shows.
 */
import type { CarburettorKind } from './karts.js';

/** An inclusive range of allowed values. */
export interface NumericRange {
  readonly min: number;
  readonly max: number;
}

/** Main jet size as stamped on the jet. */
export const MAIN_JET_RANGE = { min: 50, max: 400 } as const satisfies NumericRange;
/** Pilot (slow) jet size as stamped on the jet. */
export const PILOT_JET_RANGE = { min: 10, max: 80 } as const satisfies NumericRange;
/** Air screw, turns out from lightly seated (quarter turns are the usual step). */
export const AIR_SCREW_TURNS_RANGE = { min: 0, max: 6 } as const satisfies NumericRange;
/** Needle clip groove, counted from the top of the needle (1 = top groove). */
export const NEEDLE_CLIP_GROOVE_RANGE = { min: 1, max: 7 } as const satisfies NumericRange;
/** Idle (slide stop) screw, turns in from where it just stops touching the slide. */
export const IDLE_SCREW_TURNS_RANGE = { min: 0, max: 10 } as const satisfies NumericRange;
/** Fuel-to-oil premix ratio, parts of fuel per part of oil (32 means 32:1). */
export const PREMIX_RATIO_RANGE = { min: 8, max: 100 } as const satisfies NumericRange;

/** All numeric setup ranges by field name. */
export const SETUP_RANGES = {
  mainJet: MAIN_JET_RANGE,
  pilotJet: PILOT_JET_RANGE,
  needleClipGroove: NEEDLE_CLIP_GROOVE_RANGE,
  airScrewTurnsOut: AIR_SCREW_TURNS_RANGE,
  idleScrewTurns: IDLE_SCREW_TURNS_RANGE,
  premixRatio: PREMIX_RATIO_RANGE,
} as const satisfies Record<string, NumericRange>;

/** Whether the idle screw holds the slide open at closed throttle (`set`) or not (`backed-off`). */
export const IDLE_SCREW_STATES = ['backed-off', 'set'] as const;
export type IdleScrewState = (typeof IDLE_SCREW_STATES)[number];

export const IDLE_SCREW_STATE_LABELS: Record<IdleScrewState, string> = {
  'backed-off': 'Backed off (no idle)',
  set: 'Set (holds an idle)',
};

/**
 * A setup snapshot. Every field is optional: a racer may not know the foam date or may not have
 * counted the air screw. Dates are ISO 8601 calendar dates (`YYYY-MM-DD`).
 */
export interface SetupSnapshot {
  carburettorKind?: CarburettorKind;
  /** Main jet size (MAIN_JET_RANGE). */
  mainJet?: number;
  /** Pilot jet size (PILOT_JET_RANGE); pilot jets usually come in steps of 2.5. */
  pilotJet?: number;
  /** Needle clip groove counted from the top of the needle, 1..7. */
  needleClipGroove?: number;
  /** Air screw turns out from lightly seated, 0..6, usually in quarter turns. */
  airScrewTurnsOut?: number;
  idleScrew?: IdleScrewState;
  /** Idle screw turns in from just touching the slide (only meaningful when `idleScrew` is `set`). */
  idleScrewTurns?: number;
  /** Date the foam blocks in a pump-around bowl were last replaced. */
  foamFittedDate?: string;
  /** Date of the last carburettor rebuild (gaskets, needle, clip). */
  lastRebuildDate?: string;
  /** Fuel-to-oil ratio, e.g. 32 for 32:1. */
  premixRatio?: number;
  /** Vent lines fitted on the carburettor's vent nipples. */
  ventLinesFitted?: boolean;
  /** Vent lines routed upward (only meaningful when fitted). */
  ventLinesRoutedUp?: boolean;
}

/** The field names of a setup snapshot, in display order. */
export const SETUP_FIELDS = [
  'carburettorKind',
  'mainJet',
  'pilotJet',
  'needleClipGroove',
  'airScrewTurnsOut',
  'idleScrew',
  'idleScrewTurns',
  'foamFittedDate',
  'lastRebuildDate',
  'premixRatio',
  'ventLinesFitted',
  'ventLinesRoutedUp',
] as const satisfies readonly (keyof SetupSnapshot)[];
export type SetupField = (typeof SETUP_FIELDS)[number];

/**
 * Throttle bands, each with the carburettor circuit that mostly meters fuel there (general slide
 * carburettor tuning practice): closed to 1/8 the pilot jet and air screw, 1/8 to 1/4 the slide
 * cutaway, 1/4 to 3/4 the needle and its clip position, 3/4 to full the main jet.
 */
export const THROTTLE_BANDS = ['closed', 'up-to-quarter', 'quarter-to-three-quarters', 'three-quarters-to-full'] as const;
export type ThrottleBand = (typeof THROTTLE_BANDS)[number];

export interface ThrottleBandInfo {
  label: string;
  /** Throttle opening where the band starts and ends, as a fraction of full. */
  from: number;
  to: number;
  /** The circuit that mostly meters fuel in this band. */
  circuit: string;
}

export const THROTTLE_BAND_INFO: Record<ThrottleBand, ThrottleBandInfo> = {
  closed: { label: 'Closed to 1/8 throttle', from: 0, to: 0.125, circuit: 'Pilot jet and air screw' },
  'up-to-quarter': { label: '1/8 to 1/4 throttle', from: 0.125, to: 0.25, circuit: 'Slide cutaway' },
  'quarter-to-three-quarters': { label: '1/4 to 3/4 throttle', from: 0.25, to: 0.75, circuit: 'Needle and clip position' },
  'three-quarters-to-full': { label: '3/4 to full throttle', from: 0.75, to: 1, circuit: 'Main jet' },
};

/** Engine temperature when a symptom shows. */
export const ENGINE_TEMPS = ['cold', 'warm'] as const;
export type EngineTemp = (typeof ENGINE_TEMPS)[number];
export const ENGINE_TEMP_LABELS: Record<EngineTemp, string> = { cold: 'Cold engine', warm: 'Warm engine' };

/** Where on track a symptom shows. */
export const TRACK_POSITIONS = ['corner-entry', 'corner-exit', 'straight', 'braking'] as const;
export type TrackPosition = (typeof TRACK_POSITIONS)[number];
export const TRACK_POSITION_LABELS: Record<TrackPosition, string> = {
  'corner-entry': 'Corner entry',
  'corner-exit': 'Corner exit',
  straight: 'Straight',
  braking: 'Braking',
};
