import type { CaseDto, ResolveCaseRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/cases/:id/resolve: what fixed it (a catalog cause or "something-else") and the fix. */
export function resolveCase(caseId: string, request: ResolveCaseRequest, signal?: AbortSignal): Promise<CaseDto> {
  return api.post<CaseDto>(`/cases/${encodeURIComponent(caseId)}/resolve`, request, { signal });
}
