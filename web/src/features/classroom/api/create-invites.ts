import type { CreateClassInvitesRequest, CreateClassInvitesResponse } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** POST /api/classes/:classId/invites → 201; each address gets its own single-use link by e-mail. */
export function createInvites(
  classId: string,
  body: CreateClassInvitesRequest,
  headers: Record<string, string>,
): Promise<CreateClassInvitesResponse> {
  return api.post<CreateClassInvitesResponse>(`${classPath(classId)}/invites`, body, headers);
}

export function useCreateInvites(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateClassInvitesRequest; headers: Record<string, string> }) =>
      createInvites(classId, body, headers),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.invites(classId) }),
  });
}
