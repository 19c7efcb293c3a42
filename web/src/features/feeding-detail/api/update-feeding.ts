import type { Feeding, UpdateFeedingRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { feedingKey } from './get-feeding';

/** PATCH /api/feedings/:id → Feeding; only the fields sent change. */
export function updateFeeding(id: string, body: UpdateFeedingRequest): Promise<Feeding> {
  return api.patch<Feeding>(`/feedings/${encodeURIComponent(id)}`, body);
}

export function useUpdateFeeding(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateFeedingRequest) => updateFeeding(id, body),
    // Grams, time and temperature feed the summary, the Shelf and the culture's kinetics.
    onSuccess: (feeding) => {
      queryClient.setQueryData(feedingKey(id), feeding);
      return queryClient.invalidateQueries({ queryKey: logbookKeys.all });
    },
  });
}
