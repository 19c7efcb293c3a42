import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { commentKeys, type CommentSubject } from './query-keys';

/** DELETE /api/comments/:commentId → 204 (the author only). */
export function deleteComment(commentId: string): Promise<void> {
  return api.delete<void>(`/comments/${encodeURIComponent(commentId)}`);
}

export function useDeleteComment(subject: CommentSubject) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteComment,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentKeys.thread(subject) }),
  });
}
