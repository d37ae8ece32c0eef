import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CaseDto, OpenCaseRequest } from '@fuelwright/shared';
import { openCase, storeCase } from '../api/open-case';
import { resolveCase } from '../api/resolve-case';
import { parseConditionsDraft } from '../machines/conditions-draft';
import type { WalkThroughContext } from '../machines/walk-through.machine';
import { parseSetupDraft, symptomsForRequest } from '../machines/walk-through-model';
import { clearWalkThrough, QUICK_DIAGNOSIS_KEY } from './walk-through-storage';

/** The case to open from a quick diagnosis: its symptoms, the setup values and the day's air given, and every result with its note. */
export function openCaseRequestFrom(quick: WalkThroughContext, kartId: string): OpenCaseRequest {
  const { setup } = parseSetupDraft(quick.setupDraft);
  const request: OpenCaseRequest = { kartId, symptoms: symptomsForRequest(quick.symptoms) };
  // Without any value given, the server takes the kart's latest setup snapshot instead.
  if (Object.keys(setup).length > 0) request.setup = setup;
  // The ranking the visitor saw was made with these conditions; the case keeps them.
  const { conditions } = parseConditionsDraft(quick.conditionsDraft);
  if (conditions) request.conditions = conditions;
  if (quick.results.length > 0) {
    request.results = quick.results.map((r) => ({ checkId: r.checkId, result: r.result, ...(r.note ? { note: r.note } : {}) }));
  }
  return request;
}

/**
 * Turns the quick diagnosis kept in this browser into a case on one of the racer's karts
 * (POST /api/cases with the results already recorded), resolves it when the visitor had said what
 * fixed it, then forgets the quick diagnosis.
 */
export function useSaveQuickDiagnosis() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ quick, kartId }: { quick: WalkThroughContext; kartId: string }): Promise<CaseDto> => {
      let dto = await openCase(openCaseRequestFrom(quick, kartId));
      storeCase(queryClient, dto);
      if (quick.resolution && dto.state === 'open') {
        const { causeId, fix, note } = quick.resolution;
        dto = await resolveCase(dto.id, { causeId, fix, ...(note ? { note } : {}) });
        storeCase(queryClient, dto);
      }
      return dto;
    },
    onSuccess: () => clearWalkThrough(QUICK_DIAGNOSIS_KEY),
  });
}
