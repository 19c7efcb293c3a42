import type { CreateRiseCheckRequest, RiseCheck } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

/** POST /api/feedings/:feedingId/rise-checks → 201 RiseCheck. */
export function createRiseCheck(
  feedingId: string,
  body: CreateRiseCheckRequest,
  headers: Record<string, string>,
): Promise<RiseCheck> {
  return api.post<RiseCheck>(`/feedings/${encodeURIComponent(feedingId)}/rise-checks`, body, headers);
}

export function useCreateRiseCheck(feedingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateRiseCheckRequest; headers: Record<string, string> }) =>
      createRiseCheck(feedingId, body, headers),
    // A new reading refits the curve: the summary must be asked again.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
