import type { CaseDto, CorrectCaseFactsRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** PUT /api/cases/:id/facts: the setup and/or the day's air as they should have been; the case is ranked again. 409 once the case is finished. */
export function correctCaseFacts(caseId: string, request: CorrectCaseFactsRequest, signal?: AbortSignal): Promise<CaseDto> {
  return api.put<CaseDto>(`/cases/${encodeURIComponent(caseId)}/facts`, request, { signal });
}
