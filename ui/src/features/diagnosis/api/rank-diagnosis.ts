import type { RankRequest, RankResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/**
 * POST /api/diagnosis/rank (open to visitors, rate-limited): symptoms, setup and check results in;
 * ranked causes with their reasons and the check plan out. Stateless: nothing is saved. A 400
 * names unknown ids and out-of-range values in `fields`. Called by the walk-through machine's
 * `rank` actor, so there is no query or mutation hook.
 */
export function rankDiagnosis(request: RankRequest, signal?: AbortSignal): Promise<RankResponse> {
  return api.post<RankResponse>('/diagnosis/rank', request, { signal });
}
