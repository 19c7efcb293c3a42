import type { CommentView, CreateCommentRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { commentKeys, threadPath, type CommentSubject } from './query-keys';

/** POST /api/feedings/:id/comments or /api/plans/:id/comments → 201 CommentView. */
export function createComment(
  subject: CommentSubject,
  body: CreateCommentRequest,
  headers?: Record<string, string>,
): Promise<CommentView> {
  return api.post<CommentView>(threadPath(subject), body, headers);
}

export function useCreateComment(subject: CommentSubject) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateCommentRequest; headers?: Record<string, string> }) =>
      createComment(subject, body, headers),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentKeys.thread(subject) }),
  });
}
