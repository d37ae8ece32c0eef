import type { AbandonCaseRequest, CaseDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/cases/:id/abandon: closes the case without a fix. */
export function abandonCase(caseId: string, request: AbandonCaseRequest, signal?: AbortSignal): Promise<CaseDto> {
  return api.post<CaseDto>(`/cases/${encodeURIComponent(caseId)}/abandon`, request, { signal });
}
