import type { CommentView, CreateCommentRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useCurrentAccount } from '@/lib/auth/current-account';
import { sendOrHold } from '@/lib/outbox/outbox';
import { commentKeys, threadPath, type CommentSubject } from './query-keys';

/** POST /api/feedings/:id/comments or /api/plans/:id/comments → 201 CommentView. */
export function createComment(
  subject: CommentSubject,
  body: CreateCommentRequest,
  headers?: Record<string, string>,
): Promise<CommentView> {
  return api.post<CommentView>(threadPath(subject), body, headers);
}

/** Resolves to the comment, or undefined when it was kept in the outbox to send later. */
export function useCreateComment(subject: CommentSubject) {
  const queryClient = useQueryClient();
  const accountId = useCurrentAccount().data?.id;
  return useMutation({
    // Offline the write goes to the outbox instead of waiting for a signal.
    networkMode: 'always',
    mutationFn: ({ body, headers }: { body: CreateCommentRequest; headers?: Record<string, string> }) =>
      sendOrHold(
        {
          accountId,
          kind: 'comment',
          path: threadPath(subject),
          body,
          headers,
          // The thread's page as the writer saw it (an instructor's and a baker's differ).
          openPath: window.location.pathname,
          detail: body.body.length > 80 ? `${body.body.slice(0, 79)}…` : body.body,
        },
        (h) => createComment(subject, body, h),
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentKeys.thread(subject) }),
  });
}
