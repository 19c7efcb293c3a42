import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** DELETE /api/classes/:classId/invites/:inviteId → 204; the link stops working. */
export function revokeInvite(classId: string, inviteId: string): Promise<void> {
  return api.delete<void>(`${classPath(classId)}/invites/${encodeURIComponent(inviteId)}`);
}

export function useRevokeInvite(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: string) => revokeInvite(classId, inviteId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.invites(classId) }),
  });
}
