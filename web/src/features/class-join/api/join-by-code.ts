import type { BakingClass, JoinClassByCodeRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/class-join → the class, now with the viewer as a student. */
export function joinByCode(body: JoinClassByCodeRequest, headers?: Record<string, string>): Promise<BakingClass> {
  return api.post<BakingClass>('/class-join', body, headers);
}

export function useJoinByCode() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: JoinClassByCodeRequest; headers?: Record<string, string> }) =>
      joinByCode(body, headers),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['classes'] }),
  });
}
