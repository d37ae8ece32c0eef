import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CommentDto } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** GET /api/cases/:id/comments: the case's thread, oldest first (owner and those it is shared with). */
export async function getComments(caseId: string, signal?: AbortSignal): Promise<CommentDto[]> {
  const { comments } = await api.get<{ comments: CommentDto[] }>(`/cases/${encodeURIComponent(caseId)}/comments`, { signal });
  return comments;
}

/** Everything the review panels load for one case sits under this key. */
export const reviewQueryKey = (caseId: string) => ['review', caseId] as const;
export const commentsQueryKey = (caseId: string) => [...reviewQueryKey(caseId), 'comments'] as const;

export function getCommentsQueryOptions(caseId: string) {
  return queryOptions({
    queryKey: commentsQueryKey(caseId),
    queryFn: ({ signal }) => getComments(caseId, signal),
    // The other side may write while the page is open.
    refetchInterval: 60_000,
  });
}

export function useComments(caseId: string) {
  return useQuery(getCommentsQueryOptions(caseId));
}
