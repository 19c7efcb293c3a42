import type { BakingClass } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/class-invites/:token/accept → the class, now with the viewer as a student. */
export function acceptInvite(token: string, headers?: Record<string, string>): Promise<BakingClass> {
  return api.post<BakingClass>(`/class-invites/${encodeURIComponent(token)}/accept`, undefined, headers);
}

export function useAcceptInvite(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (headers?: Record<string, string>) => acceptInvite(token, headers),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['classes'] }),
  });
}
