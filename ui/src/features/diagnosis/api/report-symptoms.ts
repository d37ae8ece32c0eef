import type { CaseDto, ReportSymptomsRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** PUT /api/cases/:id/symptoms: the symptoms as they are now; the case is ranked again. */
export function reportSymptoms(caseId: string, request: ReportSymptomsRequest, signal?: AbortSignal): Promise<CaseDto> {
  return api.put<CaseDto>(`/cases/${encodeURIComponent(caseId)}/symptoms`, request, { signal });
}
