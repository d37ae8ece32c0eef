import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PhotoDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { reviewQueryKey } from './get-comments';

/** GET /api/cases/:id/photos: the case's photos; `url` and `thumbUrl` are cookie-checked downloads. */
export async function getPhotos(caseId: string, signal?: AbortSignal): Promise<PhotoDto[]> {
  const { photos } = await api.get<{ photos: PhotoDto[] }>(`/cases/${encodeURIComponent(caseId)}/photos`, { signal });
  return photos;
}

export const photosQueryKey = (caseId: string) => [...reviewQueryKey(caseId), 'photos'] as const;

export function getPhotosQueryOptions(caseId: string) {
  return queryOptions({ queryKey: photosQueryKey(caseId), queryFn: ({ signal }) => getPhotos(caseId, signal) });
}

export function usePhotos(caseId: string) {
  return useQuery(getPhotosQueryOptions(caseId));
}
