/**
 * The guided walk-through, one machine for both modes:
 * - `quick`: a visitor's (or anyone's) diagnosis over POST /api/diagnosis/rank; nothing is saved
 *   on the server (the page keeps the machine's snapshot in localStorage);
 * - `case`: a saved case over the case routes (open, report symptoms, record a result, resolve,
 *   abandon); the server's case is the truth and is reconciled on load.
 *
 * intake -> ranking (causes and plan) -> check (cautions first, then steps; record a result)
 * -> ranking (re-ranked) -> ... -> resolve or stopped -> summary.
 * Case mode, open case: from the ranking, the setup and the day's air may be corrected (PUT
 * /api/cases/:id/facts), which ranks the case again with the results so far.
 * Back goes to the previous check (recording again replaces its result), Skip moves a check to
 * the end of the plan for now. All I/O is in the actors, which the page provides.
 */
import { assign, fromPromise, setup } from 'xstate';
import type {
  CarburettorKind,
  CaseDto,
  CaseState,
  CheckResultValue,
  CorrectCaseFactsRequest,
  DiagnosisConditions,
  OpenCaseRequest,
  RankRequest,
  RankResponse,
  RecordCheckResultRequest,
  ResolveCaseRequest,
  SetupDto,
  StopFinding,
  SymptomReport,
} from '@fuelwright/shared';
import {
  draftFromSetup,
  fromCase,
  nextCheckId,
  orderedPlan,
  parseSetupDraft,
  previousCheckId,
  resultsMap,
  symptomsForRequest,
  toWalkThroughError,
  topCauses,
  withResult,
  type CauseProbability,
  type RecordedResult,
  type Resolution,
  type SetupDraft,
  type SetupDraftField,
  type WalkThroughError,
  type WalkThroughMode,
} from './walk-through-model';
import {
  conditionErrorsAfterEdit,
  correctedConditions,
  draftFromConditions,
  emptyConditionsDraft,
  parseConditionsDraft,
  type ConditionsDraft,
} from './conditions-draft';

/** Where the walk-through was when it was last at rest: reconciling with the server returns there. */
export type WalkThroughPlace = 'intake' | 'ranking' | 'check' | 'resolve' | 'correcting';

/** Case mode: the setup and the day's air being corrected, as typed (prefilled from the case). */
export interface FactsCorrection {
  setupDraft: SetupDraft;
  conditionsDraft: ConditionsDraft;
}

export interface WalkThroughInput {
  mode: WalkThroughMode;
  /** Case mode: the saved case to continue (absent for a case still to be opened). */
  caseId?: string | null;
  /** Case mode: the kart chosen beforehand (e.g. from `?kartId=`). */
  kartId?: string | null;
  /** Ids of the catalog's checks that carry cautions: those are acknowledged before the steps show. */
  cautionCheckIds: readonly string[];
}

export interface WalkThroughContext {
  mode: WalkThroughMode;
  caseId: string | null;
  kartId: string | null;
  /** Case mode: the kart's name, from the case. */
  kartName: string | null;
  displacementCc: number | null;
  // intake
  symptoms: SymptomReport[];
  carburettorKind: CarburettorKind | null;
  setupDraft: SetupDraft;
  /** Day of the kart's setup snapshot the draft was filled from, if any. */
  setupFrom: string | null;
  setupTouched: boolean;
  /** Today's air, the reference day and the fuel age, as typed (see conditions-draft.ts). */
  conditionsDraft: ConditionsDraft;
  /** Case mode: the day's air and fuel age the case holds now. */
  caseConditions: DiagnosisConditions;
  /** Case mode, open case: the correction of the setup and the day's air being typed, if any. */
  correction: FactsCorrection | null;
  /** Messages found before sending (missing symptom, kart, setup values out of range), by field. */
  formErrors: Record<string, string>;
  // diagnosis
  cautionCheckIds: string[];
  rank: RankResponse | null;
  /** Cause probabilities before the last step, to show what changed. */
  previousCauses: CauseProbability[] | null;
  /** The result recorded by the last step (shown over the re-ranked causes). */
  lastRecorded: RecordedResult | null;
  /** Case mode: the last step corrected the setup or the day's air (said over the re-ranked causes). */
  factsCorrected: boolean;
  results: RecordedResult[];
  /** Checks skipped for now, in the order skipped: they go to the end of the plan. */
  skipped: string[];
  currentCheckId: string | null;
  /** Checks whose cautions were acknowledged. */
  acknowledged: string[];
  /** A result on its way to the server. */
  pending: RecordedResult | null;
  resolution: Resolution | null;
  stop: StopFinding | null;
  caseState: CaseState | null;
  rulesetVersion: string | null;
  /** Null until the walk-through first comes to rest (a saved case being loaded). */
  place: WalkThroughPlace | null;
  error: WalkThroughError | null;
  /** A plain message for the top of the screen (e.g. the case was changed elsewhere). */
  notice: string | null;
}

export type WalkThroughEvent =
  | { type: 'INTAKE.SYMPTOMS'; symptoms: SymptomReport[] }
  | { type: 'INTAKE.CARBURETTOR'; carburettorKind: CarburettorKind | null }
  | { type: 'INTAKE.SETUP'; field: SetupDraftField; value: string }
  | { type: 'INTAKE.CONDITIONS'; draft: ConditionsDraft }
  | { type: 'INTAKE.KART'; kartId: string; carburettorKind: CarburettorKind; displacementCc: number }
  | { type: 'INTAKE.SUBMIT' }
  | { type: 'INTAKE.EDIT' }
  | { type: 'INTAKE.CANCEL' }
  | { type: 'FACTS.EDIT' }
  | { type: 'FACTS.SETUP'; field: SetupDraftField; value: string }
  | { type: 'FACTS.CONDITIONS'; draft: ConditionsDraft }
  | { type: 'FACTS.SUBMIT' }
  | { type: 'FACTS.CANCEL' }
  | { type: 'CHECKS.START' }
  | { type: 'CAUTIONS.ACKNOWLEDGE' }
  | { type: 'CHECK.RECORD'; result: CheckResultValue; note?: string }
  | { type: 'CHECK.BACK' }
  | { type: 'CHECK.SKIP' }
  | { type: 'RANKING.SHOW' }
  | { type: 'RESOLVE.START' }
  | { type: 'RESOLVE.SUBMIT'; causeId: string; fix: string; note?: string }
  | { type: 'RESOLVE.CANCEL' }
  | { type: 'ABANDON'; reason?: string }
  | { type: 'FINISH' }
  | { type: 'STOP.ACKNOWLEDGE' }
  | { type: 'RESTART' }
  | { type: 'RECONCILE' }
  | { type: 'RETRY' }
  | { type: 'ERROR.DISMISS' };

export interface CaseRef {
  caseId: string;
}

/** The I/O the page provides with `machine.provide({ actors })`. */
export const walkThroughActorNames = [
  'rank',
  'loadKartSetup',
  'openCase',
  'loadCase',
  'reportSymptoms',
  'correctFacts',
  'recordResult',
  'resolveCase',
  'abandonCase',
] as const;

function notProvided(name: string): never {
  throw new Error(`The walk-through's "${name}" actor was not provided.`);
}

const CLOSED_ELSEWHERE = 'This case was changed elsewhere; here it is as it stands now.';

function emptyContext(input: WalkThroughInput): WalkThroughContext {
  return {
    mode: input.mode,
    caseId: input.caseId ?? null,
    kartId: input.kartId ?? null,
    kartName: null,
    displacementCc: null,
    symptoms: [],
    carburettorKind: null,
    setupDraft: {},
    setupFrom: null,
    setupTouched: false,
    conditionsDraft: emptyConditionsDraft(),
    caseConditions: {},
    correction: null,
    formErrors: {},
    cautionCheckIds: [...input.cautionCheckIds],
    rank: null,
    previousCauses: null,
    lastRecorded: null,
    factsCorrected: false,
    results: [],
    skipped: [],
    currentCheckId: null,
    acknowledged: [],
    pending: null,
    resolution: null,
    stop: null,
    caseState: null,
    rulesetVersion: null,
    place: null,
    error: null,
    notice: null,
  };
}

/** What is missing or wrong in the intake before anything is sent. */
export function intakeErrors(context: WalkThroughContext): Record<string, string> {
  const errors: Record<string, string> = {};
  if (context.symptoms.length === 0) errors.symptoms = 'Pick at least one thing the engine does.';
  if (context.mode === 'case' && !context.kartId) errors.kartId = 'Pick the kart this is about.';
  if (context.mode === 'quick' && !context.carburettorKind) {
    errors.carburettorKind = 'Pick the kind of carburettor: it changes which causes are possible.';
  }
  // A case already open keeps the setup it was opened with.
  if (!(context.mode === 'case' && context.caseId)) {
    for (const [field, message] of Object.entries(parseSetupDraft(context.setupDraft).errors)) {
      errors[`setup.${field}`] = message;
    }
    Object.assign(errors, parseConditionsDraft(context.conditionsDraft).errors);
  }
  return errors;
}

/** What cannot be read in the correction of an open case's setup and day's air, by request field. */
export function correctionErrors(correction: FactsCorrection | null): Record<string, string> {
  if (!correction) return {};
  const errors: Record<string, string> = {};
  for (const [field, message] of Object.entries(parseSetupDraft(correction.setupDraft).errors)) {
    errors[`setup.${field}`] = message;
  }
  return { ...errors, ...parseConditionsDraft(correction.conditionsDraft).errors };
}

/**
 * The correction as PUT /api/cases/:id/facts takes it: always the setup (it reads back exactly as
 * the case holds it), and the conditions only when they differ from the case's.
 */
export function correctionRequest(context: WalkThroughContext): CorrectCaseFactsRequest {
  const correction = context.correction!;
  const conditions = correctedConditions(correction.conditionsDraft, context.caseConditions);
  return {
    setup: { ...parseSetupDraft(correction.setupDraft).setup, ...(context.carburettorKind ? { carburettorKind: context.carburettorKind } : {}) },
    ...(conditions ? { conditions } : {}),
  };
}

function rankRequest(context: WalkThroughContext, results: RecordedResult[]): RankRequest {
  const request: RankRequest = {
    symptoms: symptomsForRequest(context.symptoms),
    setup: { ...parseSetupDraft(context.setupDraft).setup, ...(context.carburettorKind ? { carburettorKind: context.carburettorKind } : {}) },
  };
  const { conditions } = parseConditionsDraft(context.conditionsDraft);
  if (conditions) request.conditions = conditions;
  if (results.length > 0) request.results = resultsMap(results);
  if (context.displacementCc) request.engineDisplacementCc = context.displacementCc;
  return request;
}

function caseOutput(event: unknown): CaseDto {
  return (event as { output: CaseDto }).output;
}

function rankOutput(event: unknown): RankResponse {
  return (event as { output: RankResponse }).output;
}

function errorOf(event: unknown): WalkThroughError {
  return toWalkThroughError((event as { error: unknown }).error);
}

function without(errors: Record<string, string>, key: string): Record<string, string> {
  if (!(key in errors)) return errors;
  const copy = { ...errors };
  delete copy[key];
  return copy;
}

export const walkThroughMachine = setup({
  types: {
    context: {} as WalkThroughContext,
    events: {} as WalkThroughEvent,
    input: {} as WalkThroughInput,
    tags: {} as 'busy',
  },
  actors: {
    rank: fromPromise<RankResponse, RankRequest>(async () => notProvided('rank')),
    loadKartSetup: fromPromise<SetupDto | null, { kartId: string }>(async () => notProvided('loadKartSetup')),
    openCase: fromPromise<CaseDto, OpenCaseRequest>(async () => notProvided('openCase')),
    loadCase: fromPromise<CaseDto, CaseRef>(async () => notProvided('loadCase')),
    reportSymptoms: fromPromise<CaseDto, CaseRef & { symptoms: SymptomReport[] }>(async () => notProvided('reportSymptoms')),
    correctFacts: fromPromise<CaseDto, CaseRef & CorrectCaseFactsRequest>(async () => notProvided('correctFacts')),
    recordResult: fromPromise<CaseDto, CaseRef & RecordCheckResultRequest>(async () => notProvided('recordResult')),
    resolveCase: fromPromise<CaseDto, CaseRef & ResolveCaseRequest>(async () => notProvided('resolveCase')),
    abandonCase: fromPromise<CaseDto, CaseRef & { reason?: string }>(async () => notProvided('abandonCase')),
  },
  guards: {
    isQuick: ({ context }) => context.mode === 'quick',
    isCase: ({ context }) => context.mode === 'case',
    isOpenCase: ({ context }) => context.mode === 'case' && context.caseId !== null,
    isNewCase: ({ context }) => context.mode === 'case' && context.caseId === null,
    canCorrectFacts: ({ context }) => context.mode === 'case' && context.caseId !== null && context.caseState === 'open',
    correctionInvalid: ({ context }) => Object.keys(correctionErrors(context.correction)).length > 0,
    hasRank: ({ context }) => context.rank !== null,
    intakeInvalid: ({ context }) => Object.keys(intakeErrors(context)).length > 0,
    hasNextCheck: ({ context }) => nextCheckId(context.rank, context.skipped) !== null,
    hasPreviousCheck: ({ context }) => previousCheckId(context.results, context.currentCheckId) !== null,
    hasRecordedCheck: ({ context }) => context.results.length > 0,
    needsAcknowledgement: ({ context }) => {
      const id = context.currentCheckId;
      if (id === null || context.acknowledged.includes(id)) return false;
      const step = context.rank?.plan.find((s) => s.checkId === id);
      return context.cautionCheckIds.includes(id) || (step?.cautions.length ?? 0) > 0;
    },
    resolutionInvalid: ({ event }) =>
      event.type === 'RESOLVE.SUBMIT' && (event.causeId.trim() === '' || event.fix.trim() === ''),
    rankStopped: ({ event }) => rankOutput(event).stop !== undefined,
    caseStopped: ({ event }) => caseOutput(event).state === 'stopped',
    caseFinished: ({ event }) => caseOutput(event).state !== 'open',
    /** After a reload: the check the racer was on is still to do, and nothing new was recorded for it. */
    placeStillCheck: ({ context, event }) => {
      const dto = caseOutput(event);
      const id = context.currentCheckId;
      if (context.place !== 'check' || id === null) return false;
      const server = dto.results.find((r) => r.checkId === id)?.result;
      const local = context.results.find((r) => r.checkId === id)?.result;
      const known = dto.rank.plan.some((s) => s.checkId === id) || server !== undefined;
      return known && server === local;
    },
    placeIsResolve: ({ context }) => context.place === 'resolve',
    placeIsIntake: ({ context }) => context.place === 'intake',
    placeIsCorrecting: ({ context }) => context.place === 'correcting' && context.correction !== null,
    isConflict: ({ event }) => errorOf(event).status === 409,
  },
  actions: {
    clearError: assign({ error: null, formErrors: {} }),
    setError: assign({ error: ({ event }) => errorOf(event) }),
    setIntakeErrors: assign({ formErrors: ({ context }) => intakeErrors(context) }),
    noteConflict: assign({ notice: CLOSED_ELSEWHERE, error: null }),
    commitQuickResult: assign(({ context, event }) => {
      const output = rankOutput(event);
      const recorded = context.pending!;
      return {
        results: withResult(context.results, recorded),
        rank: output,
        stop: output.stop ?? null,
        previousCauses: topCauses(context.rank),
        lastRecorded: recorded,
        skipped: context.skipped.filter((id) => id !== recorded.checkId),
        pending: null,
        error: null,
      };
    }),
    commitCaseResult: assign(({ context, event }) => {
      const facts = fromCase(caseOutput(event));
      const recorded = new Set(facts.results.map((r) => r.checkId));
      return {
        ...facts,
        previousCauses: topCauses(context.rank),
        lastRecorded: context.pending,
        factsCorrected: false,
        skipped: context.skipped.filter((id) => !recorded.has(id)),
        pending: null,
        error: null,
        formErrors: {},
      };
    }),
    commitCorrection: assign(({ context, event }) => {
      const facts = fromCase(caseOutput(event));
      return {
        ...facts,
        previousCauses: topCauses(context.rank),
        lastRecorded: null,
        factsCorrected: true,
        correction: null,
        error: null,
        formErrors: {},
      };
    }),
    applyCase: assign(({ context, event }) => {
      const facts = fromCase(caseOutput(event));
      const recorded = new Set(facts.results.map((r) => r.checkId));
      return {
        ...facts,
        // Checks recorded on the server are no longer "skipped for now".
        skipped: context.skipped.filter((id) => !recorded.has(id)),
        factsCorrected: false,
        error: null,
        formErrors: {},
      };
    }),
  },
}).createMachine({
  id: 'walkThrough',
  context: ({ input }) => emptyContext(input),
  initial: 'boot',
  on: {
    'ERROR.DISMISS': { actions: assign({ error: null, notice: null }) },
    // Case mode, after restoring a saved snapshot: the server's case is the truth.
    RECONCILE: { guard: 'isOpenCase', target: '.syncing' },
  },
  states: {
    boot: {
      always: [{ guard: 'isOpenCase', target: 'syncing' }, { target: 'intake' }],
    },

    /** Case mode: load the case from the server (first visit, or reconciling a restored snapshot). */
    syncing: {
      tags: 'busy',
      invoke: {
        src: 'loadCase',
        input: ({ context }) => ({ caseId: context.caseId! }),
        onDone: [
          { guard: 'caseStopped', target: 'stopped', actions: 'applyCase' },
          { guard: 'caseFinished', target: 'summary', actions: 'applyCase' },
          { guard: 'placeStillCheck', target: 'check', actions: 'applyCase' },
          { guard: 'placeIsResolve', target: 'resolve', actions: 'applyCase' },
          { guard: 'placeIsIntake', target: 'intake', actions: 'applyCase' },
          // A correction being typed stays as typed (the case's facts are read again beside it).
          { guard: 'placeIsCorrecting', target: 'correcting', actions: 'applyCase' },
          { target: 'ranking', actions: 'applyCase' },
        ],
        onError: { target: 'failed', actions: 'setError' },
      },
    },

    failed: {
      on: { RETRY: { target: 'syncing', actions: 'clearError' } },
    },

    intake: {
      entry: assign({ place: 'intake' }),
      initial: 'editing',
      on: {
        'INTAKE.SYMPTOMS': {
          actions: assign({
            symptoms: ({ event }) => event.symptoms,
            formErrors: ({ context }) => without(context.formErrors, 'symptoms'),
          }),
        },
        'INTAKE.CARBURETTOR': {
          guard: 'isQuick',
          actions: assign({
            carburettorKind: ({ event }) => event.carburettorKind,
            formErrors: ({ context }) => without(context.formErrors, 'carburettorKind'),
          }),
        },
        'INTAKE.KART': {
          guard: 'isNewCase',
          target: '.prefilling',
          reenter: true,
          actions: assign({
            kartId: ({ event }) => event.kartId,
            carburettorKind: ({ event }) => event.carburettorKind,
            displacementCc: ({ event }) => event.displacementCc,
            formErrors: ({ context }) => without(context.formErrors, 'kartId'),
          }),
        },
        'INTAKE.SETUP': {
          actions: assign({
            setupDraft: ({ context, event }) => ({ ...context.setupDraft, [event.field]: event.value }),
            setupTouched: true,
            formErrors: ({ context, event }) => without(context.formErrors, `setup.${event.field}`),
          }),
        },
        'INTAKE.CONDITIONS': {
          actions: assign({
            conditionsDraft: ({ event }) => event.draft,
            formErrors: ({ context, event }) => conditionErrorsAfterEdit(context.formErrors, event.draft),
          }),
        },
      },
      states: {
        editing: {
          on: {
            'INTAKE.SUBMIT': [
              { guard: 'intakeInvalid', actions: 'setIntakeErrors' },
              { guard: 'isQuick', target: 'ranking', actions: 'clearError' },
              { guard: 'isOpenCase', target: 'updating', actions: 'clearError' },
              { target: 'opening', actions: 'clearError' },
            ],
            'INTAKE.CANCEL': { guard: 'hasRank', target: '#walkThrough.ranking', actions: 'clearError' },
          },
        },

        /** Case mode: the kart's latest setup snapshot fills the setup (the racer may still change it). */
        prefilling: {
          tags: 'busy',
          invoke: {
            src: 'loadKartSetup',
            input: ({ context }) => ({ kartId: context.kartId! }),
            onDone: {
              target: 'editing',
              actions: assign(({ event }) => {
                const latest = event.output;
                return {
                  setupDraft: latest ? draftFromSetup(latest) : {},
                  setupFrom: latest?.takenOn ?? null,
                  setupTouched: false,
                };
              }),
            },
            // No setup to fill from is not an error: the racer types what they know.
            onError: { target: 'editing', actions: assign({ setupDraft: {}, setupFrom: null }) },
          },
        },

        /** Quick mode: POST /api/diagnosis/rank. */
        ranking: {
          tags: 'busy',
          invoke: {
            src: 'rank',
            input: ({ context }) => rankRequest(context, context.results),
            onDone: [
              {
                guard: 'rankStopped',
                target: '#walkThrough.stopped',
                actions: assign({ rank: ({ event }) => event.output, stop: ({ event }) => event.output.stop ?? null }),
              },
              {
                target: '#walkThrough.ranking',
                actions: assign({
                  rank: ({ event }) => event.output,
                  previousCauses: null,
                  lastRecorded: null,
                  rulesetVersion: ({ event }) => event.output.version,
                }),
              },
            ],
            onError: { target: 'editing', actions: 'setError' },
          },
        },

        /** Case mode, new case: POST /api/cases. */
        opening: {
          tags: 'busy',
          invoke: {
            src: 'openCase',
            input: ({ context }) => {
              const { setup: values } = parseSetupDraft(context.setupDraft);
              const { conditions } = parseConditionsDraft(context.conditionsDraft);
              return {
                kartId: context.kartId!,
                symptoms: symptomsForRequest(context.symptoms),
                // Untouched, the server takes the kart's latest snapshot itself.
                ...(context.setupTouched ? { setup: values } : {}),
                ...(conditions ? { conditions } : {}),
              };
            },
            onDone: [
              { guard: 'caseStopped', target: '#walkThrough.stopped', actions: 'applyCase' },
              { target: '#walkThrough.ranking', actions: ['applyCase', assign({ previousCauses: null, lastRecorded: null })] },
            ],
            onError: { target: 'editing', actions: 'setError' },
          },
        },

        /** Case mode, open case: PUT /api/cases/:id/symptoms. */
        updating: {
          tags: 'busy',
          invoke: {
            src: 'reportSymptoms',
            input: ({ context }) => ({ caseId: context.caseId!, symptoms: symptomsForRequest(context.symptoms) }),
            onDone: {
              target: '#walkThrough.ranking',
              // The causes before the change first: applyCase replaces the ranking (actions run in order).
              actions: [assign({ previousCauses: ({ context }) => topCauses(context.rank), lastRecorded: null }), 'applyCase'],
            },
            onError: [
              { guard: 'isConflict', target: '#walkThrough.syncing', actions: 'noteConflict' },
              { target: 'editing', actions: 'setError' },
            ],
          },
        },
      },
    },

    /** The ranked causes and the plan (after the intake, and again after every recorded check). */
    ranking: {
      entry: assign({ place: 'ranking' }),
      initial: 'idle',
      states: {
        idle: {
          on: {
            'CHECKS.START': {
              guard: 'hasNextCheck',
              target: '#walkThrough.check',
              actions: assign({ currentCheckId: ({ context }) => nextCheckId(context.rank, context.skipped), error: null }),
            },
            'INTAKE.EDIT': { target: '#walkThrough.intake', actions: 'clearError' },
            'FACTS.EDIT': {
              guard: 'canCorrectFacts',
              target: '#walkThrough.correcting',
              actions: [
                'clearError',
                assign({
                  correction: ({ context }) => ({ setupDraft: { ...context.setupDraft }, conditionsDraft: draftFromConditions(context.caseConditions) }),
                }),
              ],
            },
            'RESOLVE.START': { target: '#walkThrough.resolve', actions: 'clearError' },
            // From the causes, Back opens the check recorded last.
            'CHECK.BACK': {
              guard: 'hasRecordedCheck',
              target: '#walkThrough.check',
              actions: assign({ currentCheckId: ({ context }) => previousCheckId(context.results, null), error: null }),
            },
            ABANDON: { guard: 'isOpenCase', target: 'abandoning', actions: 'clearError' },
            // Quick mode: end without a fix (nothing found, or done for today).
            FINISH: { guard: 'isQuick', target: '#walkThrough.summary', actions: 'clearError' },
          },
        },
        abandoning: {
          tags: 'busy',
          invoke: {
            src: 'abandonCase',
            input: ({ context, event }) => ({
              caseId: context.caseId!,
              ...(event.type === 'ABANDON' && event.reason?.trim() ? { reason: event.reason.trim() } : {}),
            }),
            onDone: { target: '#walkThrough.summary', actions: 'applyCase' },
            onError: [
              { guard: 'isConflict', target: '#walkThrough.syncing', actions: 'noteConflict' },
              { target: 'idle', actions: 'setError' },
            ],
          },
        },
      },
    },

    /** Case mode, open case: correct the setup and the day's air; PUT /api/cases/:id/facts ranks it again. */
    correcting: {
      entry: assign({ place: 'correcting' }),
      initial: 'editing',
      on: {
        'FACTS.SETUP': {
          actions: assign({
            correction: ({ context, event }) =>
              context.correction && { ...context.correction, setupDraft: { ...context.correction.setupDraft, [event.field]: event.value } },
            formErrors: ({ context, event }) => without(context.formErrors, `setup.${event.field}`),
          }),
        },
        'FACTS.CONDITIONS': {
          actions: assign({
            correction: ({ context, event }) => context.correction && { ...context.correction, conditionsDraft: event.draft },
            formErrors: ({ context, event }) => conditionErrorsAfterEdit(context.formErrors, event.draft),
          }),
        },
      },
      states: {
        editing: {
          on: {
            'FACTS.SUBMIT': [
              { guard: 'correctionInvalid', actions: assign({ formErrors: ({ context }) => correctionErrors(context.correction), error: null }) },
              { target: 'saving', actions: 'clearError' },
            ],
            'FACTS.CANCEL': { target: '#walkThrough.ranking', actions: ['clearError', assign({ correction: null })] },
          },
        },
        saving: {
          tags: 'busy',
          invoke: {
            src: 'correctFacts',
            input: ({ context }) => ({ caseId: context.caseId!, ...correctionRequest(context) }),
            onDone: [
              { guard: 'caseStopped', target: '#walkThrough.stopped', actions: 'commitCorrection' },
              { target: '#walkThrough.ranking', actions: 'commitCorrection' },
            ],
            onError: [
              { guard: 'isConflict', target: '#walkThrough.syncing', actions: ['noteConflict', assign({ correction: null })] },
              // The typed correction stays; a 400's messages go under their fields.
              { target: 'editing', actions: 'setError' },
            ],
          },
        },
      },
    },

    /** One check: its cautions first (acknowledged), then its steps and the result. */
    check: {
      entry: assign({ place: 'check' }),
      initial: 'entering',
      states: {
        entering: {
          always: [{ guard: 'needsAcknowledgement', target: 'cautions' }, { target: 'steps' }],
        },
        cautions: {
          on: {
            'CAUTIONS.ACKNOWLEDGE': {
              target: 'steps',
              actions: assign({
                acknowledged: ({ context }) =>
                  context.currentCheckId && !context.acknowledged.includes(context.currentCheckId)
                    ? [...context.acknowledged, context.currentCheckId]
                    : context.acknowledged,
              }),
            },
          },
        },
        steps: {
          on: {
            'CHECK.RECORD': [
              {
                guard: 'isQuick',
                target: 'ranking',
                actions: assign({
                  pending: ({ context, event }) => ({ checkId: context.currentCheckId!, result: event.result, note: event.note?.trim() ?? '' }),
                  error: null,
                }),
              },
              {
                target: 'saving',
                actions: assign({
                  pending: ({ context, event }) => ({ checkId: context.currentCheckId!, result: event.result, note: event.note?.trim() ?? '' }),
                  error: null,
                }),
              },
            ],
          },
        },

        /** Quick mode: rank again with the new result. */
        ranking: {
          tags: 'busy',
          invoke: {
            src: 'rank',
            input: ({ context }) => rankRequest(context, withResult(context.results, context.pending!)),
            onDone: [
              {
                guard: 'rankStopped',
                target: '#walkThrough.stopped',
                actions: 'commitQuickResult',
              },
              { target: '#walkThrough.ranking', actions: 'commitQuickResult' },
            ],
            onError: { target: 'steps', actions: ['setError', assign({ pending: null })] },
          },
        },

        /** Case mode: POST /api/cases/:id/results. */
        saving: {
          tags: 'busy',
          invoke: {
            src: 'recordResult',
            input: ({ context }) => ({
              caseId: context.caseId!,
              checkId: context.pending!.checkId,
              result: context.pending!.result,
              ...(context.pending!.note ? { note: context.pending!.note } : {}),
            }),
            onDone: [
              { guard: 'caseStopped', target: '#walkThrough.stopped', actions: 'commitCaseResult' },
              { target: '#walkThrough.ranking', actions: 'commitCaseResult' },
            ],
            onError: [
              { guard: 'isConflict', target: '#walkThrough.syncing', actions: ['noteConflict', assign({ pending: null })] },
              { target: 'steps', actions: ['setError', assign({ pending: null })] },
            ],
          },
        },
      },
      on: {
        'CHECK.BACK': [
          {
            guard: 'hasPreviousCheck',
            target: '#walkThrough.check',
            reenter: true,
            actions: assign({ currentCheckId: ({ context }) => previousCheckId(context.results, context.currentCheckId), error: null }),
          },
          { target: '#walkThrough.ranking', actions: 'clearError' },
        ],
        'CHECK.SKIP': {
          target: '#walkThrough.check',
          reenter: true,
          actions: assign(({ context }) => {
            const current = context.currentCheckId;
            const skipped = current ? [...context.skipped.filter((id) => id !== current), current] : context.skipped;
            const plan = orderedPlan(context.rank, skipped);
            const next = plan.find((step) => step.checkId !== current)?.checkId ?? current;
            return { skipped, currentCheckId: next, error: null };
          }),
        },
        'RANKING.SHOW': { target: '#walkThrough.ranking', actions: 'clearError' },
      },
    },

    /** What fixed it: a cause from the catalog or "something else", and the fix. */
    resolve: {
      entry: assign({ place: 'resolve' }),
      initial: 'editing',
      states: {
        editing: {
          on: {
            'RESOLVE.SUBMIT': [
              {
                guard: 'resolutionInvalid',
                actions: assign({
                  formErrors: ({ event }) => {
                    const errors: Record<string, string> = {};
                    if (event.type !== 'RESOLVE.SUBMIT') return errors;
                    if (event.causeId.trim() === '') errors.causeId = 'Pick what was wrong, or "Something else".';
                    if (event.fix.trim() === '') errors.fix = 'Say what you did that fixed it.';
                    return errors;
                  },
                }),
              },
              {
                guard: 'isQuick',
                target: '#walkThrough.summary',
                actions: assign({
                  resolution: ({ event }) => ({ causeId: event.causeId, fix: event.fix.trim(), note: event.note?.trim() ?? '' }),
                  formErrors: {},
                }),
              },
              { target: 'saving', actions: 'clearError' },
            ],
            'RESOLVE.CANCEL': { target: '#walkThrough.ranking', actions: 'clearError' },
          },
        },
        saving: {
          tags: 'busy',
          invoke: {
            src: 'resolveCase',
            input: ({ context, event }) => {
              const e = event as Extract<WalkThroughEvent, { type: 'RESOLVE.SUBMIT' }>;
              return {
                caseId: context.caseId!,
                causeId: e.causeId,
                fix: e.fix.trim(),
                ...(e.note?.trim() ? { note: e.note.trim() } : {}),
              };
            },
            onDone: { target: '#walkThrough.summary', actions: 'applyCase' },
            onError: [
              { guard: 'isConflict', target: '#walkThrough.syncing', actions: 'noteConflict' },
              { target: 'editing', actions: 'setError' },
            ],
          },
        },
      },
    },

    /** A finding that ends the walk-through: do not drive, see a qualified engine builder. */
    stopped: {
      on: {
        'STOP.ACKNOWLEDGE': 'summary',
      },
    },

    summary: {
      on: {
        RESTART: {
          guard: 'isQuick',
          target: 'intake',
          actions: assign(({ context }) => ({ ...emptyContext({ mode: 'quick', cautionCheckIds: context.cautionCheckIds }) })),
        },
      },
    },
  },
});

export type WalkThroughMachine = typeof walkThroughMachine;
