import type { CatalogResponse, OutcomeDto, WorkOrderDto } from '@fuelwright/shared';

/** A small catalog: labels only matter here (invented wording, no fact of the trade is checked). */
export const CATALOG = {
  version: '1.0.0',
  throttleBands: [],
  engineTemps: [],
  trackPositions: [],
  groups: [],
  checks: [],
  fixes: [],
  cautions: [],
  symptoms: [
    {
      id: 'fuel-from-vents',
      label: 'Fuel comes out of the vents',
      description: 'Fuel spills from the vent nipples.',
      dimensions: [],
      cautions: [{ id: 'fuel-leak-stop', severity: 'stop', title: 'Fuel near hot parts', text: 'Do not start the engine.' }],
    },
    { id: 'hesitation', label: 'Hesitates or stutters', description: 'A flat spot.', dimensions: [], cautions: [] },
  ],
  causes: [
    { id: 'vent-lines-off', label: 'Vent lines missing or not routed up', description: 'Vent lines off.', prior: 0.04, fixes: [] },
    { id: 'foam-degraded', label: 'Bowl foam missing, rotten or soaked', description: 'Old foam.', prior: 0.05, carburettorKinds: ['pump-around'], fixes: [] },
    { id: 'fuel-level-high', label: 'Fuel level too high', description: 'Too much fuel in the bowl.', prior: 0.06, fixes: [] },
  ],
  somethingElse: { label: 'Something else', prior: 0.05 },
} as unknown as CatalogResponse;

export function workOrder(overrides: Partial<WorkOrderDto> = {}): WorkOrderDto {
  return {
    id: 'wo-1',
    caseId: null,
    customerName: 'Walk-in customer',
    kartDescription: '125 shifter',
    symptoms: [{ id: 'fuel-from-vents' }],
    setup: {},
    status: 'open',
    notes: '',
    createdAt: '2026-11-20T09:00:00.000Z',
    outcomes: 0,
    ...overrides,
  };
}

export function outcome(overrides: Partial<OutcomeDto> = {}): OutcomeDto {
  return {
    id: 'out-1',
    caseId: null,
    workOrderId: 'wo-1',
    rulesetVersion: '1.0.0',
    symptomIds: ['fuel-from-vents'],
    topCauseId: 'vent-lines-off',
    confirmedCauses: ['vent-lines-off'],
    otherNote: '',
    fix: 'Fitted vent lines',
    parts: '',
    labourMinutes: 10,
    stillFixed: null,
    supersedesId: null,
    current: true,
    loggedByName: 'Test shop',
    demo: false,
    at: '2026-11-20T10:00:00.000Z',
    ...overrides,
  };
}
