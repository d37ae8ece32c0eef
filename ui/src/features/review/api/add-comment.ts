import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CommentDto, CreateCommentRequest } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';
import { commentsQueryKey } from './get-comments';
import { sharedCasesQueryKey } from './get-shared-cases';

export interface AddCommentInput extends CreateCommentRequest {
  caseId: string;
}

/** POST /api/cases/:id/comments: plain text, at most COMMENT_MAX_LENGTH characters; the other side is e-mailed. */
export function addComment({ caseId, body }: AddCommentInput): Promise<CommentDto> {
  return api.post<CommentDto>(`/cases/${encodeURIComponent(caseId)}/comments`, { body } satisfies CreateCommentRequest);
}

export function useAddComment(caseId: string) {
  const queryClient = useQueryClient();
  const queryKey = commentsQueryKey(caseId);
  return useMutation({
    mutationFn: (body: string) => addComment({ caseId, body }),
    onSuccess: (comment) => {
      queryClient.setQueryData(queryKey, (comments: CommentDto[] | undefined) => (comments ? [...comments, comment] : [comment]));
    },
    onSettled: () => {
      void queryClient.invalidateQueries({ queryKey });
      void queryClient.invalidateQueries({ queryKey: sharedCasesQueryKey });
    },
  });
}
