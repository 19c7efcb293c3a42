import {
  batches,
  TEMPERATURE_READINGS_MAX_PER_REQUEST,
  type LoggerReading,
  type TemperatureReadingBatchResponse,
  IDEMPOTENCY_KEY_HEADER,
} from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

export interface AddProgress {
  /** Batches already stored, so a retry after a lost connection starts at the next one. */
  done: number;
  /** One Idempotency-Key per batch, kept across a retry: a batch that did arrive is not stored twice. */
  keys: string[];
  /** Readings stored so far, over every attempt. */
  added: number;
}

export function newProgress(readings: number): AddProgress {
  const count = Math.ceil(readings / TEMPERATURE_READINGS_MAX_PER_REQUEST);
  return { done: 0, keys: Array.from({ length: count }, () => crypto.randomUUID()), added: 0 };
}

/** POST /api/feedings/:feedingId/temperatures, one request per TEMPERATURE_READINGS_MAX_PER_REQUEST readings. */
export async function addReadings(
  feedingId: string,
  readings: readonly LoggerReading[],
  progress: AddProgress,
): Promise<number> {
  const parts = batches(readings, TEMPERATURE_READINGS_MAX_PER_REQUEST);
  for (let i = progress.done; i < parts.length; i++) {
    const part = parts[i] ?? [];
    const body = { readings: part.map((r) => ({ takenAt: new Date(r.ms).toISOString(), temperatureC: r.c })) };
    const answer = await api.post<TemperatureReadingBatchResponse>(
      `/feedings/${encodeURIComponent(feedingId)}/temperatures`,
      body,
      { [IDEMPOTENCY_KEY_HEADER]: progress.keys[i] ?? crypto.randomUUID() },
    );
    progress.added += answer.items.length;
    progress.done = i + 1;
  }
  return progress.added;
}

export function useAddReadings(feedingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ readings, progress }: { readings: readonly LoggerReading[]; progress: AddProgress }) =>
      addReadings(feedingId, readings, progress),
    // The model integrates the readings, so the forecast and the feeding page change with them;
    // after a failed batch too, since the batches before it were stored.
    onSettled: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
