import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PhotoRequestDto, PhotoRequestInput } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { photoRequestsQueryKey } from './get-photo-requests';
import { sharedCasesQueryKey } from './get-shared-cases';

/** POST /api/cases/:id/photo-requests (a shared coach or shop): the racer is e-mailed. */
export function requestPhoto(caseId: string, request: PhotoRequestInput): Promise<PhotoRequestDto> {
  return api.post<PhotoRequestDto>(`/cases/${encodeURIComponent(caseId)}/photo-requests`, request);
}

export function useRequestPhoto(caseId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: PhotoRequestInput) => requestPhoto(caseId, request),
    onSettled: () => {
      void queryClient.invalidateQueries({ queryKey: photoRequestsQueryKey(caseId) });
      void queryClient.invalidateQueries({ queryKey: sharedCasesQueryKey });
    },
  });
}
