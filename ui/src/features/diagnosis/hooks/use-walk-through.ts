import { useEffect, useMemo, useRef, useState } from 'react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useActorRef, useSelector } from '@xstate/react';
import { createActor, fromPromise, type Snapshot } from 'xstate';
import type {
  CaseDto,
  CorrectCaseFactsRequest,
  OpenCaseRequest,
  RankRequest,
  RankResponse,
  RecordCheckResultRequest,
  ResolveCaseRequest,
  SetupDto,
  SymptomReport,
} from '@fuelwright/shared';
import { abandonCase } from '../api/abandon-case';
import { correctCaseFacts } from '../api/correct-case-facts';
import { getCaseQueryOptions } from '../api/get-case';
import { getKartSetupsQueryOptions } from '../api/get-kart-setups';
import { openCase, storeCase } from '../api/open-case';
import { rankDiagnosis } from '../api/rank-diagnosis';
import { recordCheckResult } from '../api/record-check-result';
import { reportSymptoms } from '../api/report-symptoms';
import { resolveCase } from '../api/resolve-case';
import { walkThroughMachine, type CaseRef, type WalkThroughInput } from '../machines/walk-through.machine';
import { caseStorageKey, clearWalkThrough, loadWalkThrough, saveWalkThrough } from './walk-through-storage';

/** The machine with its I/O: the API routes, through the query cache so the case pages stay current. */
export function walkThroughWithApi(queryClient: QueryClient) {
  const changed = async (request: Promise<CaseDto>) => {
    const dto = await request;
    storeCase(queryClient, dto);
    return dto;
  };
  return walkThroughMachine.provide({
    actors: {
      rank: fromPromise<RankResponse, RankRequest>(({ input, signal }) => rankDiagnosis(input, signal)),
      loadKartSetup: fromPromise<SetupDto | null, { kartId: string }>(async ({ input }) => {
        const setups = await queryClient.fetchQuery(getKartSetupsQueryOptions(input.kartId));
        return setups[0] ?? null;
      }),
      openCase: fromPromise<CaseDto, OpenCaseRequest>(({ input }) => changed(openCase(input))),
      loadCase: fromPromise<CaseDto, CaseRef>(({ input }) => queryClient.fetchQuery({ ...getCaseQueryOptions(input.caseId), staleTime: 0 })),
      reportSymptoms: fromPromise<CaseDto, CaseRef & { symptoms: SymptomReport[] }>(({ input }) =>
        changed(reportSymptoms(input.caseId, { symptoms: input.symptoms })),
      ),
      correctFacts: fromPromise<CaseDto, CaseRef & CorrectCaseFactsRequest>(({ input: { caseId, ...request } }) =>
        changed(correctCaseFacts(caseId, request)),
      ),
      recordResult: fromPromise<CaseDto, CaseRef & RecordCheckResultRequest>(({ input: { caseId, ...request } }) =>
        changed(recordCheckResult(caseId, request)),
      ),
      resolveCase: fromPromise<CaseDto, CaseRef & ResolveCaseRequest>(({ input: { caseId, ...request } }) =>
        changed(resolveCase(caseId, request)),
      ),
      abandonCase: fromPromise<CaseDto, CaseRef & { reason?: string }>(({ input: { caseId, ...request } }) =>
        changed(abandonCase(caseId, request)),
      ),
    },
  });
}

export interface UseWalkThroughOptions extends WalkThroughInput {
  /** Where the snapshot is kept in this browser (see walk-through-storage.ts). */
  storageKey: string;
}

/**
 * Runs the walk-through for a page: restores the stored snapshot when there is one that fits (and,
 * for a saved case, reconciles it with the server), stores every snapshot at rest, and moves the
 * storage to the case's own key once a new case is opened.
 */
export function useWalkThrough(options: UseWalkThroughOptions) {
  const queryClient = useQueryClient();
  const machine = useMemo(() => walkThroughWithApi(queryClient), [queryClient]);
  const [start] = useState(() => {
    const input: WalkThroughInput = {
      mode: options.mode,
      caseId: options.caseId ?? null,
      kartId: options.kartId ?? null,
      cautionCheckIds: options.cautionCheckIds,
    };
    const stored = loadWalkThrough(options.storageKey);
    const fits =
      stored !== null &&
      stored.context.mode === options.mode &&
      stored.context.caseId === (options.caseId ?? null) &&
      (!options.kartId || stored.context.kartId === options.kartId);
    if (stored && fits) {
      try {
        // Throws when the stored state is not one this machine has.
        createActor(machine, { snapshot: stored as Snapshot<unknown>, input });
        return { input, snapshot: stored as Snapshot<unknown> };
      } catch {
        /* fall through: start afresh */
      }
    }
    if (stored) clearWalkThrough(options.storageKey);
    return { input, snapshot: undefined };
  });

  const actorRef = useActorRef(machine, start.snapshot ? { input: start.input, snapshot: start.snapshot } : { input: start.input });
  const snapshot = useSelector(actorRef, (s) => s);

  // A saved case restored from this browser: the server's case is the truth. Until the machine has
  // been told to reconcile, the restored place is not shown: a tap on it would be lost when the
  // machine goes to load the case (its screens unmount while it does).
  const mustReconcile = Boolean(start.snapshot) && options.mode === 'case' && Boolean(options.caseId);
  const [settling, setSettling] = useState(mustReconcile);
  const reconciled = useRef(false);
  useEffect(() => {
    if (reconciled.current || !mustReconcile) return;
    reconciled.current = true;
    actorRef.send({ type: 'RECONCILE' });
    setSettling(false);
  }, [actorRef, mustReconcile]);

  const storageKey = options.storageKey;
  useEffect(() => {
    const subscription = actorRef.subscribe((next) => {
      if (next.status !== 'active' || next.hasTag('busy')) return;
      const caseId = next.context.mode === 'case' ? next.context.caseId : null;
      const key = caseId ? caseStorageKey(caseId) : storageKey;
      saveWalkThrough(key, actorRef.getPersistedSnapshot());
      if (key !== storageKey) clearWalkThrough(storageKey);
    });
    return () => subscription.unsubscribe();
  }, [actorRef, storageKey]);

  /** `settling`: a restored case not yet handed to the server to reconcile (show it as loading). */
  return { snapshot, send: actorRef.send, actorRef, settling };
}

export type WalkThroughSnapshot = ReturnType<typeof useWalkThrough>['snapshot'];
export type WalkThroughSend = ReturnType<typeof useWalkThrough>['send'];
