/**
 * Invented wire data for the case screens' tests, shaped like the real answers of
 * GET /api/catalog, /api/cases and /api/cases/:id (trimmed). Not a fact of the trade: the
 * probabilities are whatever the ranking said, and the tests only check they are shown.
 */
import type { CaseDto, CaseSummaryDto, CatalogResponse, KartDto } from '@fuelwright/shared';

export const CATALOG = {
  version: '1.0.0',
  throttleBands: [],
  engineTemps: [],
  trackPositions: [],
  groups: [],
  symptoms: [
    { id: 'bog-on-acceleration', label: 'Bogs when you open the throttle', description: '', dimensions: [], cautions: [] },
    { id: 'sporadic-running', label: 'Runs on and off', description: '', dimensions: [], cautions: [] },
    { id: 'high-idle', label: 'Idles too fast', description: '', dimensions: [], cautions: [] },
  ],
  causes: [
    { id: 'foam-degraded', label: 'Bowl foam missing, rotten or soaked', description: '', prior: 0.05, fixes: [] },
    { id: 'splash-plate-bent', label: 'Splash plate bent or missing', description: '', prior: 0.03, fixes: [] },
    { id: 'idle-screw-set', label: 'Idle screw holds the slide open', description: '', prior: 0.03, fixes: [] },
  ],
  checks: [{ id: 'foam-inspect', label: 'Look at the bowl foam' } as CatalogResponse['checks'][number]],
  fixes: [],
  cautions: [],
  somethingElse: { label: 'Something else (ignition, compression, gearing or chassis)', prior: 0.1 },
} as CatalogResponse;

export const KARTS: KartDto[] = [
  { id: 'k1', ownerId: 'u', ownerName: 'Test racer', name: 'Blue 27', displacementCc: 125, drive: 'gearbox', carburettorKind: 'pump-around', notes: '', createdAt: '2026-01-01T00:00:00Z', updatedAt: '2026-01-01T00:00:00Z' },
  { id: 'k2', ownerId: 'u', ownerName: 'Test racer', name: 'Practice', displacementCc: 80, drive: 'gearbox', carburettorKind: 'pump-around', notes: '', createdAt: '2026-01-01T00:00:00Z', updatedAt: '2026-01-01T00:00:00Z' },
];

const summary = (patch: Partial<CaseSummaryDto> & Pick<CaseSummaryDto, 'id'>): CaseSummaryDto => ({
  kartId: 'k1',
  kartName: 'Blue 27',
  ownerId: 'u',
  ownerName: 'Test racer',
  state: 'open',
  rulesetVersion: '1.0.0',
  symptomIds: ['bog-on-acceleration', 'sporadic-running'],
  topCauseId: 'foam-degraded',
  topCauseProbability: 0.4768,
  openedAt: '2026-11-20T10:00:00.000Z',
  updatedAt: '2026-11-20T10:05:00.000Z',
  ...patch,
});

export const CASE_SUMMARIES: CaseSummaryDto[] = [
  summary({ id: 'c-open' }),
  summary({
    id: 'c-abandoned',
    kartId: 'k2',
    kartName: 'Practice',
    state: 'abandoned',
    symptomIds: ['high-idle'],
    topCauseId: 'idle-screw-set',
    topCauseProbability: 0.78,
    openedAt: '2026-11-10T09:00:00.000Z',
    updatedAt: '2026-11-22T09:00:00.000Z',
  }),
];

export const OPEN_CASE: CaseDto = {
  ...CASE_SUMMARIES[0],
  topCauseProbability: 0.9111,
  symptoms: [{ id: 'bog-on-acceleration', band: 'quarter-to-three-quarters', engine: 'warm', where: ['corner-exit'] }, { id: 'sporadic-running' }],
  setup: { carburettorKind: 'pump-around', mainJet: 182.5, pilotJet: 37.5, needleClipGroove: 3, premixRatio: 32 },
  conditions: { densityChangePct: 4.2, fuelAgeDays: 3 },
  results: [{ checkId: 'foam-inspect', result: 'fault-found', note: 'foam crumbles', at: '2026-11-20T10:05:00.000Z', by: 'u' }],
  rank: {
    version: '1.0.0',
    causes: [
      {
        id: 'foam-degraded',
        label: 'Bowl foam missing, rotten or soaked',
        probability: 0.9111,
        prior: 0.05,
        logOdds: 3,
        reasons: [
          { kind: 'check', text: 'The foam was found rotten', likelihoodRatio: 9, logOdds: 2.2, checkId: 'foam-inspect' },
          { kind: 'rule', text: 'The bowl foam is more than six months old', likelihoodRatio: 1.6, logOdds: 0.47, ruleId: 'foam-age' },
        ],
        fixes: [],
      },
      { id: 'splash-plate-bent', label: 'Splash plate bent or missing', probability: 0.0121, prior: 0.03, logOdds: -1, reasons: [], fixes: [] },
    ],
    somethingElse: { label: 'Something else (ignition, compression, gearing or chassis)', probability: 0.02 },
    excluded: [],
    plan: [],
    expectedMinutes: 0,
    cautions: [],
  },
  openingRank: undefined as unknown as CaseDto['openingRank'],
  resolution: null,
  stop: null,
  abandonedReason: null,
  recommendations: [],
  events: [
    {
      seq: 1,
      type: 'opened',
      at: '2026-11-20T10:00:00.000Z',
      actorId: 'u',
      actorName: 'Test racer',
      summary: 'Case opened with 2 symptoms (ruleset 1.0.0)',
      payload: {},
      topCauses: [{ id: 'foam-degraded', probability: 0.4768 }],
    },
    {
      seq: 2,
      type: 'check-recorded',
      at: '2026-11-20T10:05:00.000Z',
      actorId: 'u',
      actorName: 'Test racer',
      summary: 'foam-inspect: Fault found (foam crumbles)',
      payload: {},
      topCauses: [{ id: 'foam-degraded', probability: 0.9111 }],
    },
  ],
} as unknown as CaseDto;
OPEN_CASE.openingRank = OPEN_CASE.rank;
