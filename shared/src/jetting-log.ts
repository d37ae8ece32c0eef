/**
 * Jetting log, jet kit, jet suggestion and unit-preference contracts:
 *   GET/POST /api/karts/:id/sessions, DELETE /api/karts/:id/sessions/:sessionId
 *   GET/PUT  /api/karts/:id/jet-kit
 *   POST     /api/karts/:id/jet-suggestion
 *   GET/PUT  /api/me/preferences
 * The API always speaks °C, hPa, metres and kg/m³; the UI converts for display (shared/src/units).
 */
import type { AirResponse } from './air/compute-air.js';
import type { JetNumberScaling, JetSizeSet, JetSuggestion } from './jetting/jet-suggestion.js';
import type { UnitPreferences } from './units/units.js';

/** How the kart ran on the session. Sessions that ran `right` are the jet suggestion's baselines. */
export const RAN_VALUES = ['rich', 'right', 'lean'] as const;
export type Ran = (typeof RAN_VALUES)[number];

export const RAN_LABELS: Record<Ran, string> = {
  rich: 'Rich (boggy, smoky, wet plug)',
  right: 'Right (clean pull, good plug)',
  lean: 'Lean (hot, flat at the top, white plug)',
};

/** Colour of the plug's insulator nose after a clean cut (plug chop), lean to rich. */
export const PLUG_COLOURS = ['white', 'light-tan', 'tan', 'dark-brown', 'black-wet'] as const;
export type PlugColour = (typeof PLUG_COLOURS)[number];

export const PLUG_COLOUR_LABELS: Record<PlugColour, string> = {
  white: 'White or grey (lean)',
  'light-tan': 'Light tan',
  tan: 'Tan',
  'dark-brown': 'Dark brown',
  'black-wet': 'Black or wet (rich)',
};

/**
 * Ranges the jetting log accepts for the day's air, wider than the formulas' comfortable ranges
 * (computeAir warns there) but narrower than nonsense: air a kart could run in.
 */
export const SESSION_AIR_RANGES = {
  /** Air temperature, °C. */
  temperatureC: { min: -40, max: 60 },
  /** Absolute pressure at the track, hPa (about 5 500 m up to below sea level). */
  stationPressureHpa: { min: 500, max: 1100 },
  relativeHumidityPct: { min: 0, max: 100 },
  /** Track elevation, geometric metres. */
  altitudeM: { min: -500, max: 5000 },
  /** Sea-level pressure (QNH), hPa. */
  seaLevelPressureHpa: { min: 870, max: 1085 },
} as const;

/** A lap time, milliseconds: from 10 s to 10 min. */
export const LAP_TIME_MS_RANGE = { min: 10_000, max: 600_000 } as const;
export const TRACK_NAME_MAX_LENGTH = 120;
export const SESSION_NOTE_MAX_LENGTH = 2000;

/**
 * Today's air as the racer reads it: temperature and humidity, and either the station pressure
 * (a barometer at the track) or the track elevation with the sea-level pressure of a weather report.
 */
export interface AirReading {
  temperatureC: number;
  relativeHumidityPct: number;
  stationPressureHpa?: number;
  /** Track elevation, geometric metres. */
  altitudeM?: number;
  /** Sea-level pressure (QNH), hPa. */
  seaLevelPressureHpa?: number;
}

/** POST /api/karts/:id/sessions. The service computes the densities from the air. */
export interface JettingSessionInput extends AirReading {
  /** The day of the session, YYYY-MM-DD, not in the future. */
  sessionOn: string;
  track?: string;
  /** A setup snapshot of this kart it ran with. */
  setupId?: string;
  mainJet: number;
  pilotJet?: number;
  needleClipGroove?: number;
  airScrewTurnsOut?: number;
  plugColour?: PlugColour;
  ran: Ran;
  lapTimeMs?: number;
  note?: string;
}

export interface JettingSessionDto {
  id: string;
  kartId: string;
  sessionOn: string;
  track: string;
  temperatureC: number;
  /** Station pressure used (given, or computed from elevation and sea-level pressure), hPa. */
  stationPressureHpa: number;
  relativeHumidityPct: number;
  /** Moist-air density (CIPM-2007) computed when the session was logged, kg/m³. */
  densityKgM3: number;
  dryAirDensityKgM3: number;
  setupId: string | null;
  mainJet: number;
  pilotJet: number | null;
  needleClipGroove: number | null;
  airScrewTurnsOut: number | null;
  plugColour: PlugColour | null;
  ran: Ran;
  lapTimeMs: number | null;
  note: string;
  createdAt: string;
}

/** GET /api/karts/:id/sessions: newest first. */
export interface JettingSessionListResponse {
  sessions: JettingSessionDto[];
}

/** The racer's jet kit: how jet numbers scale, and which sizes are held. */
export interface JetKit {
  scaling: JetNumberScaling;
  main: JetSizeSet;
  pilot: JetSizeSet;
}

/** Used until the racer saves a kit: diameter-numbered jets in steps of 2.5. */
export const DEFAULT_JET_KIT: Readonly<JetKit> = Object.freeze({
  scaling: 'diameter',
  main: Object.freeze({ step: 2.5 }),
  pilot: Object.freeze({ step: 2.5 }),
});

export const JET_KIT_MAX_SIZES = 60;

/** GET/PUT /api/karts/:id/jet-kit. `saved` is false while the default is shown. */
export interface JetKitResponse {
  jetKit: JetKit;
  saved: boolean;
}

/** POST /api/karts/:id/jet-suggestion: today's air, and optionally which "right" session to start from. */
export interface JetSuggestionInput extends AirReading {
  baselineSessionId?: string;
}

export interface JetSuggestionResponse {
  /** Today's air figures. */
  air: AirResponse;
  /** The session the suggestion starts from. */
  baseline: JettingSessionDto;
  /** Every session that ran right (the baseline included), oldest first: the logged range. */
  rightSessions: JettingSessionDto[];
  jetKit: JetKit;
  suggestion: JetSuggestion;
}

/** The per-user preferences (GET/PUT /api/me/preferences). */
export interface UserPreferences {
  units: UnitPreferences;
}
