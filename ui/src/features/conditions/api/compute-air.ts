import { useMutation } from '@tanstack/react-query';
import type { AirRequest, AirResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/conditions/air (open to visitors): today's air figures; nothing is stored. */
export async function computeAir(request: AirRequest): Promise<AirResponse> {
  return api.post<AirResponse>('/conditions/air', request);
}

export function useComputeAir() {
  return useMutation({ mutationFn: computeAir });
}
