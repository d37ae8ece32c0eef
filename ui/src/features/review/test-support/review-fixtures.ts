/**
 * Invented wire data for the review panels' tests, shaped like the real answers of
 * GET /api/cases/:id, /api/catalog, /api/shared-cases (trimmed). Not a fact of the trade: the
 * tests only check that what the server says is shown and what the user does is sent.
 */
import type { CaseDto, CatalogResponse, PlanStep, SharedCaseSummaryDto } from '@fuelwright/shared';

export const RACER_ID = 'racer-1';
export const COACH_ID = 'coach-1';

export const CATALOG = {
  version: '1.0.0',
  throttleBands: [],
  engineTemps: [],
  trackPositions: [],
  groups: [],
  symptoms: [{ id: 'bog-on-acceleration', label: 'Bogs when you open the throttle', description: '', dimensions: [], cautions: [] }],
  causes: [{ id: 'foam-degraded', label: 'Bowl foam missing, rotten or soaked', description: '', prior: 0.05, fixes: [] }],
  checks: [
    { id: 'foam-inspect', label: 'Look at the bowl foam' },
    { id: 'plate-inspect', label: 'Look at the splash plate' },
  ] as CatalogResponse['checks'],
  fixes: [],
  cautions: [],
  somethingElse: { label: 'Something else', prior: 0.1 },
} as CatalogResponse;

const step = (checkId: string, label: string, patch: Partial<PlanStep> = {}): PlanStep => ({
  checkId,
  label,
  group: 'bowl' as PlanStep['group'],
  minutes: 5,
  openingMinutes: 0,
  cautions: [],
  findProbability: 0.3,
  causes: ['foam-degraded'],
  safetyFirst: false,
  ...patch,
});

export function sharedCase(patch: Partial<CaseDto> = {}): CaseDto {
  const rank = {
    version: '1.0.0',
    causes: [{ id: 'foam-degraded', label: 'Bowl foam missing, rotten or soaked', probability: 0.5, prior: 0.05, logOdds: 0, reasons: [], fixes: [] }],
    somethingElse: { label: 'Something else', probability: 0.1 },
    excluded: [],
    plan: [step('foam-inspect', 'Look at the bowl foam'), step('plate-inspect', 'Look at the splash plate')],
    expectedMinutes: 10,
    cautions: [],
  };
  return {
    id: 'c1',
    kartId: 'k1',
    kartName: 'Blue 27',
    ownerId: RACER_ID,
    ownerName: 'Rae Racer',
    state: 'open',
    rulesetVersion: '1.0.0',
    symptomIds: ['bog-on-acceleration'],
    topCauseId: 'foam-degraded',
    topCauseProbability: 0.5,
    openedAt: '2026-11-20T10:00:00.000Z',
    updatedAt: '2026-11-20T10:05:00.000Z',
    symptoms: [{ id: 'bog-on-acceleration' }],
    setup: { carburettorKind: 'pump-around' },
    conditions: {},
    results: [],
    rank,
    openingRank: rank,
    resolution: null,
    stop: null,
    abandonedReason: null,
    recommendations: [],
    events: [{ seq: 1, type: 'opened', at: '2026-11-20T10:00:00.000Z', actorId: RACER_ID, actorName: 'Rae Racer', summary: 'Case opened', payload: {} }],
    ...patch,
  } as CaseDto;
}

/** The case after the coach recommended the splash plate check: it leads the plan. */
export function recommendedCase(): CaseDto {
  const c = sharedCase();
  const reason = 'The plate was knocked last week';
  const recommendation = { by: COACH_ID, byName: 'Cole Coach', reason };
  return {
    ...c,
    rank: { ...c.rank, plan: [{ ...c.rank.plan[1], recommendation }, c.rank.plan[0]] },
    recommendations: [{ checkId: 'plate-inspect', reason, by: COACH_ID, byName: 'Cole Coach', at: '2026-11-20T11:00:00.000Z', pending: true }],
  };
}

export const summary = (patch: Partial<SharedCaseSummaryDto> & Pick<SharedCaseSummaryDto, 'id'>): SharedCaseSummaryDto => ({
  kartId: 'k1',
  kartName: 'Blue 27',
  ownerId: RACER_ID,
  ownerName: 'Rae Racer',
  state: 'open',
  topCauseId: 'foam-degraded',
  topCauseProbability: 0.5,
  updatedAt: '2026-11-20T10:05:00.000Z',
  openedAt: '2026-11-20T10:00:00.000Z',
  comments: 0,
  pendingPhotoRequests: 0,
  ...patch,
});
