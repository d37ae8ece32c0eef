/**
 * Facts: what the rules can look at, each a pure function of the (validated, normalised) rank
 * request and the date. All facts are computed once per request and handed to the rule
 * evaluator as constants, so no fact is computed twice and none needs a cache key.
 */
import {
  CARBURETTOR_KINDS,
  IDLE_SCREW_STATES,
  SETUP_RANGES,
  densityChangePct,
  moistAirDensity,
  type AirFigures,
  type CheckResultValue,
  type DiagnosisConditions,
  type EngineTemp,
  type NumericRange,
  type SetupSnapshot,
  type ThrottleBand,
  type TrackPosition,
} from '@fuelwright/shared';
import {
  AIR_SCREW_USUAL_TURNS_OUT,
  EIGHTY_CC_BAND,
  MAIN_JET_USUAL_80CC,
  NEEDLE_CLIP_ENDS,
  PILOT_JET_USUAL_80CC,
  needleClipEnd,
  vsUsual,
  type VsUsual,
} from './trade.js';

/** A reported symptom with its details as lists (empty = not said). */
export interface NormalisedSymptom {
  id: string;
  bands: ThrottleBand[];
  engine: EngineTemp[];
  where: TrackPosition[];
}

/** A rank request after validation: ids known, details as lists, duplicates merged. */
export interface NormalisedRankRequest {
  symptoms: NormalisedSymptom[];
  setup: SetupSnapshot;
  conditions: DiagnosisConditions;
  results: Record<string, CheckResultValue>;
  engineDisplacementCc?: number;
  asOf?: string;
}

export interface FactContext {
  request: NormalisedRankRequest;
  /** The day the diagnosis is for. */
  now: Date;
}

/** The reported symptoms by id (the `symptoms` fact). */
export type SymptomIndex = ReadonlyMap<string, NormalisedSymptom>;
/** Check results by check id (the `checkResults` fact). */
export type CheckResultIndex = ReadonlyMap<string, CheckResultValue>;

/** The type of a fact, which decides the operators and values a rule may use with it. */
export type FactType =
  | { kind: 'number'; range?: NumericRange }
  | { kind: 'enum'; values: readonly string[] }
  | { kind: 'boolean' }
  | { kind: 'symptoms' }
  | { kind: 'checkResults' };

export interface FactDefinition {
  id: string;
  description: string;
  type: FactType;
  compute(ctx: FactContext): unknown;
}

const VS_USUAL = ['below', 'within', 'above'] as const;
const DAY_MS = 86_400_000;

/** Whole days from an ISO date to `now` (never negative); undefined when the date is absent. */
export function daysSince(isoDate: string | undefined, now: Date): number | undefined {
  if (!isoDate) return undefined;
  const t = Date.parse(isoDate);
  if (Number.isNaN(t)) return undefined;
  return Math.max(0, Math.floor((now.getTime() - t) / DAY_MS));
}

/**
 * An air density in kg/m3 from a day's figures: the density given, else CIPM-2007 moist-air
 * density from temperature, station pressure and humidity when all three are given.
 */
export function densityOf(air: AirFigures | undefined): number | undefined {
  if (!air) return undefined;
  if (typeof air.densityKgM3 === 'number') return air.densityKgM3;
  const { temperatureC, stationPressureHpa, relativeHumidityPct } = air;
  if (typeof temperatureC === 'number' && typeof stationPressureHpa === 'number' && typeof relativeHumidityPct === 'number') {
    return moistAirDensity(temperatureC, stationPressureHpa * 100, relativeHumidityPct);
  }
  return undefined;
}

/**
 * Air density change in percent (positive = denser today): the given figure, else computed from
 * today's and the reference day's air (densities, or temperature, pressure and humidity).
 */
export function densityChangeOf(conditions: DiagnosisConditions): number | undefined {
  if (typeof conditions.densityChangePct === 'number') return conditions.densityChangePct;
  const today = densityOf(conditions.today);
  const then = densityOf(conditions.reference);
  if (today !== undefined && then !== undefined && then > 0) return densityChangePct(then, today);
  return undefined;
}

/** True when the usual 80 cc jet sizes apply: the displacement is unknown or near 80 cc. */
export function eightyCcOrUnknown(displacementCc: number | undefined): boolean {
  return displacementCc === undefined || (displacementCc >= EIGHTY_CC_BAND.min && displacementCc <= EIGHTY_CC_BAND.max);
}

function jetVsUsual80cc(size: number | undefined, usual: NumericRange, displacementCc: number | undefined): VsUsual | undefined {
  if (size === undefined || !eightyCcOrUnknown(displacementCc)) return undefined;
  return vsUsual(size, usual);
}

const setupNumber = (field: keyof typeof SETUP_RANGES, description: string): FactDefinition => ({
  id: field,
  description,
  type: { kind: 'number', range: SETUP_RANGES[field] },
  compute: ({ request }) => request.setup[field],
});

/** Every fact a rule may use, by id. */
export const FACTS: readonly FactDefinition[] = [
  {
    id: 'symptoms',
    description: 'The reported symptoms with where they show (use the `shows` or `showsOnly` operator).',
    type: { kind: 'symptoms' },
    compute: ({ request }) => new Map(request.symptoms.map((s) => [s.id, s])),
  },
  {
    id: 'symptomCount',
    description: 'How many distinct symptoms were reported.',
    type: { kind: 'number', range: { min: 0, max: 100 } },
    compute: ({ request }) => request.symptoms.length,
  },
  {
    id: 'checkResults',
    description: 'Results of checks already done (use the `resultIs` operator).',
    type: { kind: 'checkResults' },
    compute: ({ request }) => new Map(Object.entries(request.results)),
  },
  {
    id: 'carburettorKind',
    description: 'Pump-around or float-valve carburettor.',
    type: { kind: 'enum', values: CARBURETTOR_KINDS },
    compute: ({ request }) => request.setup.carburettorKind,
  },
  setupNumber('mainJet', 'Main jet size.'),
  setupNumber('pilotJet', 'Pilot jet size.'),
  setupNumber('needleClipGroove', 'Needle clip groove counted from the top.'),
  setupNumber('airScrewTurnsOut', 'Air screw turns out from lightly seated.'),
  setupNumber('idleScrewTurns', 'Idle screw turns in.'),
  setupNumber('premixRatio', 'Fuel-to-oil premix ratio (32 = 32:1).'),
  {
    id: 'idleScrew',
    description: 'Idle screw backed off or set.',
    type: { kind: 'enum', values: IDLE_SCREW_STATES },
    compute: ({ request }) => request.setup.idleScrew,
  },
  {
    id: 'ventLinesFitted',
    description: 'Vent lines fitted.',
    type: { kind: 'boolean' },
    compute: ({ request }) => request.setup.ventLinesFitted,
  },
  {
    id: 'ventLinesRoutedUp',
    description: 'Vent lines routed upward.',
    type: { kind: 'boolean' },
    compute: ({ request }) => request.setup.ventLinesRoutedUp,
  },
  {
    id: 'foamAgeDays',
    description: 'Days since the bowl foam was fitted.',
    type: { kind: 'number', range: { min: 0, max: 36_500 } },
    compute: ({ request, now }) => daysSince(request.setup.foamFittedDate, now),
  },
  {
    id: 'daysSinceRebuild',
    description: 'Days since the last carburettor rebuild.',
    type: { kind: 'number', range: { min: 0, max: 36_500 } },
    compute: ({ request, now }) => daysSince(request.setup.lastRebuildDate, now),
  },
  {
    id: 'airScrewVsUsual',
    description: 'Air screw setting against the usual 1 to 2 turns out.',
    type: { kind: 'enum', values: VS_USUAL },
    compute: ({ request }) =>
      request.setup.airScrewTurnsOut === undefined ? undefined : vsUsual(request.setup.airScrewTurnsOut, AIR_SCREW_USUAL_TURNS_OUT),
  },
  {
    id: 'needleClipEnd',
    description: 'Needle clip at the top groove (leanest), at groove 5 or below (richest on a usual needle), or between.',
    type: { kind: 'enum', values: NEEDLE_CLIP_ENDS },
    compute: ({ request }) => (request.setup.needleClipGroove === undefined ? undefined : needleClipEnd(request.setup.needleClipGroove)),
  },
  {
    id: 'mainJetVsUsual80cc',
    description: 'Main jet against the sizes usual on an 80 cc shifter (absent when the engine is not about 80 cc).',
    type: { kind: 'enum', values: VS_USUAL },
    compute: ({ request }) => jetVsUsual80cc(request.setup.mainJet, MAIN_JET_USUAL_80CC, request.engineDisplacementCc),
  },
  {
    id: 'pilotJetVsUsual80cc',
    description: 'Pilot jet against the sizes usual on an 80 cc shifter (absent when the engine is not about 80 cc).',
    type: { kind: 'enum', values: VS_USUAL },
    compute: ({ request }) => jetVsUsual80cc(request.setup.pilotJet, PILOT_JET_USUAL_80CC, request.engineDisplacementCc),
  },
  {
    id: 'densityChangePct',
    description: 'Air density today against when the setup was last right, percent (positive = denser today).',
    type: { kind: 'number', range: { min: -50, max: 50 } },
    compute: ({ request }) => densityChangeOf(request.conditions),
  },
  {
    id: 'fuelAgeDays',
    description: 'Days since the fuel was mixed.',
    type: { kind: 'number', range: { min: 0, max: 3650 } },
    compute: ({ request }) => request.conditions.fuelAgeDays,
  },
  {
    id: 'engineDisplacementCc',
    description: 'Engine displacement, cc.',
    type: { kind: 'number', range: { min: 20, max: 1000 } },
    compute: ({ request }) => request.engineDisplacementCc,
  },
];

export const FACTS_BY_ID: ReadonlyMap<string, FactDefinition> = new Map(FACTS.map((f) => [f.id, f]));

/** All fact values for one request, in `FACTS` order. */
export function computeFacts(request: NormalisedRankRequest, now: Date): Map<string, unknown> {
  const ctx: FactContext = { request, now };
  const values = new Map<string, unknown>();
  for (const fact of FACTS) values.set(fact.id, fact.compute(ctx));
  return values;
}
