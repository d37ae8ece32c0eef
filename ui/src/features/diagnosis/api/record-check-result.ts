import type { CaseDto, RecordCheckResultRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/cases/:id/results: one check's result (a later one for the same check replaces it). 409 once the case is finished. */
export function recordCheckResult(caseId: string, request: RecordCheckResultRequest, signal?: AbortSignal): Promise<CaseDto> {
  return api.post<CaseDto>(`/cases/${encodeURIComponent(caseId)}/results`, request, { signal });
}
