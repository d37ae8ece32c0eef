import type {
  CaseEventType,
  CaseResolution,
  CaseState,
  CheckResultEntry,
  CheckResultValue,
  DiagnosisConditions,
  RankResponse,
  SetupSnapshot,
  StopFinding,
  SymptomReport,
} from '@fuelwright/shared';

/** Payloads of the appended events, by type. */
export interface CaseEventPayloads {
  opened: { kartId: string; symptoms: SymptomReport[]; setup: SetupSnapshot; conditions: DiagnosisConditions; rulesetVersion: string; rank: RankResponse };
  'symptoms-reported': { symptoms: SymptomReport[]; rank: RankResponse };
  'check-recorded': { checkId: string; result: CheckResultValue; note: string; rank: RankResponse };
  stopped: { stop: StopFinding };
  resolved: { causeId: string; fix: string; note: string };
  abandoned: { reason: string };
  'check-recommended': { checkId: string; reason: string };
  'facts-corrected': { setup: SetupSnapshot; conditions: DiagnosisConditions; rank: RankResponse };
}

export type CaseEvent = {
  [K in CaseEventType]: { type: K; payload: CaseEventPayloads[K]; at: Date; actorId: string | null };
}[CaseEventType];

/** The case as its events say it is. */
export interface CaseProjection {
  state: CaseState;
  kartId: string;
  rulesetVersion: string;
  symptoms: SymptomReport[];
  setup: SetupSnapshot;
  conditions: DiagnosisConditions;
  results: CheckResultEntry[];
  rank: RankResponse;
  openingRank: RankResponse;
  resolution: CaseResolution | null;
  stop: StopFinding | null;
  abandonedReason: string | null;
  /** Checks a shared coach or shop recommended, latest per check. */
  recommendations: { checkId: string; reason: string; by: string; at: string }[];
}

export class CaseEventError extends Error {}

/** Which events each state accepts. A stopped case can still be resolved (after the engine builder's repair). */
const ACCEPTS: Record<CaseState, ReadonlySet<CaseEventType>> = {
  open: new Set(['symptoms-reported', 'check-recorded', 'stopped', 'resolved', 'abandoned', 'check-recommended', 'facts-corrected']),
  stopped: new Set(['resolved', 'abandoned']),
  resolved: new Set(),
  abandoned: new Set(),
};

export function canApply(state: CaseState, type: CaseEventType): boolean {
  return ACCEPTS[state].has(type);
}

/** Applies one event; pure, so a case's timeline can be replayed to any step. */
export function applyEvent(current: CaseProjection | null, event: CaseEvent): CaseProjection {
  if (event.type === 'opened') {
    if (current) throw new CaseEventError('a case is opened only once');
    const p = event.payload;
    return {
      state: 'open',
      kartId: p.kartId,
      rulesetVersion: p.rulesetVersion,
      symptoms: p.symptoms,
      setup: p.setup,
      conditions: p.conditions,
      results: [],
      rank: p.rank,
      openingRank: p.rank,
      resolution: null,
      stop: null,
      abandonedReason: null,
      recommendations: [],
    };
  }
  if (!current) throw new CaseEventError(`"${event.type}" before the case was opened`);
  if (!canApply(current.state, event.type)) throw new CaseEventError(`a ${current.state} case does not take "${event.type}"`);
  const at = event.at.toISOString();
  const by = event.actorId ?? '';
  switch (event.type) {
    case 'symptoms-reported':
      return { ...current, symptoms: event.payload.symptoms, rank: event.payload.rank };
    case 'check-recorded': {
      const { checkId, result, note, rank } = event.payload;
      // A later result for the same check replaces the earlier one (going back to a check).
      const results = [...current.results.filter((r) => r.checkId !== checkId), { checkId, result, note, at, by }];
      return { ...current, results, rank };
    }
    case 'stopped':
      return { ...current, state: 'stopped', stop: event.payload.stop };
    case 'resolved':
      return { ...current, state: 'resolved', resolution: { ...event.payload, at, by } };
    case 'abandoned':
      return { ...current, state: 'abandoned', abandonedReason: event.payload.reason };
    case 'facts-corrected':
      return { ...current, setup: event.payload.setup, conditions: event.payload.conditions, rank: event.payload.rank };
    case 'check-recommended': {
      const { checkId, reason } = event.payload;
      const recommendations = [...(current.recommendations ?? []).filter((r) => r.checkId !== checkId), { checkId, reason, by, at }];
      return { ...current, recommendations };
    }
  }
}

export function replay(events: readonly CaseEvent[]): CaseProjection {
  let state: CaseProjection | null = null;
  for (const e of events) state = applyEvent(state, e);
  if (!state) throw new CaseEventError('a case has at least its "opened" event');
  return state;
}

/** The check results as the ranking takes them. */
export function resultsMap(p: Pick<CaseProjection, 'results'>): Record<string, CheckResultValue> {
  return Object.fromEntries(p.results.map((r) => [r.checkId, r.result]));
}
