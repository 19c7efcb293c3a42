import type { CommentListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { commentKeys, threadPath, type CommentSubject } from './query-keys';

/** While a thread is on screen, the other side's replies show up within this long. */
export const COMMENT_POLL_MS = 15_000;

/** GET /api/feedings/:id/comments or /api/plans/:id/comments → Paged<CommentView>, oldest first. */
export function getComments(subject: CommentSubject): Promise<CommentListResponse> {
  return api.get<CommentListResponse>(threadPath(subject));
}

export const commentsQueryOptions = (subject: CommentSubject) =>
  queryOptions({
    queryKey: commentKeys.thread(subject),
    queryFn: () => getComments(subject),
    // TanStack pauses the interval while the tab is hidden, so a forgotten tab costs nothing.
    refetchInterval: COMMENT_POLL_MS,
  });

export function useComments(subject: CommentSubject, enabled = true) {
  return useQuery({ ...commentsQueryOptions(subject), enabled });
}
