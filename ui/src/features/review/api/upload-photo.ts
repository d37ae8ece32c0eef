import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PhotoDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { photoRequestsQueryKey } from './get-photo-requests';
import { photosQueryKey } from './get-photos';
import { sharedCasesQueryKey } from './get-shared-cases';

export interface UploadPhotoInput {
  file: File;
  caption?: string;
  checkId?: string;
  /** Set when the photo answers a coach's or shop's request. */
  photoRequestId?: string;
}

/**
 * POST /api/cases/:id/photos (multipart): the server checks the type by content (JPEG, PNG, WebP:
 * else 415), the size (15 MB: else 413), strips location and camera tags and makes a thumbnail.
 * A refused file comes back with `fields.file`.
 */
export function uploadPhoto(caseId: string, input: UploadPhotoInput): Promise<PhotoDto> {
  const form = new FormData();
  form.append('file', input.file, input.file.name || 'photo');
  if (input.caption) form.append('caption', input.caption);
  if (input.checkId) form.append('checkId', input.checkId);
  if (input.photoRequestId) form.append('photoRequestId', input.photoRequestId);
  return api.post<PhotoDto>(`/cases/${encodeURIComponent(caseId)}/photos`, form);
}

export function useUploadPhoto(caseId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadPhotoInput) => uploadPhoto(caseId, input),
    onSuccess: (photo) => {
      queryClient.setQueryData(photosQueryKey(caseId), (photos: PhotoDto[] | undefined) => (photos ? [...photos, photo] : [photo]));
    },
    onSettled: (_photo, _error, input) => {
      void queryClient.invalidateQueries({ queryKey: photosQueryKey(caseId) });
      if (input.photoRequestId) void queryClient.invalidateQueries({ queryKey: photoRequestsQueryKey(caseId) });
      void queryClient.invalidateQueries({ queryKey: sharedCasesQueryKey });
    },
  });
}
