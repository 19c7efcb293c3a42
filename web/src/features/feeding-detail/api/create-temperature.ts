import type {
  CreateTemperatureReadingsRequest,
  NewTemperatureReading,
  TemperatureReadingBatchResponse,
} from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

/** POST /api/feedings/:feedingId/temperatures → 201 { items }: one reading is a batch of one. */
export function createTemperatures(
  feedingId: string,
  body: CreateTemperatureReadingsRequest,
  headers: Record<string, string>,
): Promise<TemperatureReadingBatchResponse> {
  return api.post<TemperatureReadingBatchResponse>(
    `/feedings/${encodeURIComponent(feedingId)}/temperatures`,
    body,
    headers,
  );
}

export function useCreateTemperature(feedingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ reading, headers }: { reading: NewTemperatureReading; headers: Record<string, string> }) =>
      createTemperatures(feedingId, { readings: [reading] }, headers),
    // The model integrates these readings, so the forecast changes with them.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
