import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PhotoRequestDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { reviewQueryKey } from './get-comments';

/** GET /api/cases/:id/photo-requests: what the coach or shop asked to see, answered or not. */
export async function getPhotoRequests(caseId: string, signal?: AbortSignal): Promise<PhotoRequestDto[]> {
  const { requests } = await api.get<{ requests: PhotoRequestDto[] }>(`/cases/${encodeURIComponent(caseId)}/photo-requests`, { signal });
  return requests;
}

export const photoRequestsQueryKey = (caseId: string) => [...reviewQueryKey(caseId), 'photo-requests'] as const;

export function getPhotoRequestsQueryOptions(caseId: string) {
  return queryOptions({ queryKey: photoRequestsQueryKey(caseId), queryFn: ({ signal }) => getPhotoRequests(caseId, signal) });
}

export function usePhotoRequests(caseId: string) {
  return useQuery(getPhotoRequestsQueryOptions(caseId));
}
