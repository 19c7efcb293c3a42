import type { CreateFeedingRequest, Feeding } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

/** POST /api/cultures/:cultureId/feedings → 201 Feeding. */
export function createFeeding(
  cultureId: string,
  body: CreateFeedingRequest,
  headers: Record<string, string>,
): Promise<Feeding> {
  return api.post<Feeding>(`/cultures/${encodeURIComponent(cultureId)}/feedings`, body, headers);
}

export function useCreateFeeding(cultureId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateFeedingRequest; headers: Record<string, string> }) =>
      createFeeding(cultureId, body, headers),
    // The summary (state, first prediction) and the feedings table change with a new feeding.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
