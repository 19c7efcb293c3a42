import {
  batches,
  TEMPERATURE_READINGS_MAX_PER_REQUEST,
  type KitchenReadingListResponse,
  type KitchenReadingsAdded,
  type LoggerReading,
  type TemperatureReadingBatchResponse,
  type TemperatureReadingListResponse,
  IDEMPOTENCY_KEY_HEADER,
} from '@peakwise/shared';
import { api } from '@/lib/api-client';

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

/** Where a logger's readings go: a feeding (the jar's air) or a bake (the kitchen's). */
export interface ReadingsTarget {
  /** Stores one batch; answers how many of it were new. */
  post(
    body: { readings: { takenAt: string; temperatureC: number }[] },
    headers: Record<string, string>,
  ): Promise<number>;
  /** The instants (ms) already stored, so importing the same file twice adds nothing the second time. */
  existingTimes(): Promise<Set<number>>;
}

/** One request per TEMPERATURE_READINGS_MAX_PER_REQUEST readings, resuming where `progress` stopped. */
export async function addReadings(
  target: ReadingsTarget,
  readings: readonly LoggerReading[],
  progress: AddProgress,
): Promise<number> {
  const parts = batches(readings, TEMPERATURE_READINGS_MAX_PER_REQUEST);
  for (let i = progress.done; i < parts.length; i++) {
    const part = parts[i] ?? [];
    const body = { readings: part.map((r) => ({ takenAt: new Date(r.ms).toISOString(), temperatureC: r.c })) };
    progress.added += await target.post(body, { [IDEMPOTENCY_KEY_HEADER]: progress.keys[i] ?? crypto.randomUUID() });
    progress.done = i + 1;
  }
  return progress.added;
}

const timesOf = (items: { takenAt: string }[]) => new Set(items.map((r) => Date.parse(r.takenAt)));

/** POST /api/feedings/:feedingId/temperatures; GET the same for what is there (one page of the
 * list's largest size: an import adds at most 577 readings, 48 h at one per 5 min). */
export function feedingTarget(feedingId: string): ReadingsTarget {
  const url = `/feedings/${encodeURIComponent(feedingId)}/temperatures`;
  return {
    post: async (body, headers) => (await api.post<TemperatureReadingBatchResponse>(url, body, headers)).items.length,
    existingTimes: async () =>
      timesOf(
        (await api.get<TemperatureReadingListResponse>(`${url}?limit=${TEMPERATURE_READINGS_MAX_PER_REQUEST}`)).items,
      ),
  };
}

/** POST /api/plans/:id/kitchen-temperatures (times already there are skipped by the server too). */
export function kitchenTarget(planId: string): ReadingsTarget {
  const url = `/plans/${encodeURIComponent(planId)}/kitchen-temperatures`;
  return {
    post: async (body, headers) => (await api.post<KitchenReadingsAdded>(url, body, headers)).added,
    existingTimes: async () => timesOf((await api.get<KitchenReadingListResponse>(url)).items),
  };
}
