import type { Feeding } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

// Under the logbook's root key (next to its rise checks), so every logbook write refreshes it.
export const feedingKey = (id: string) => [...logbookKeys.all, 'feeding', id] as const;

/** GET /api/feedings/:id → Feeding (404 for someone else's). */
export function getFeeding(id: string): Promise<Feeding> {
  return api.get<Feeding>(`/feedings/${encodeURIComponent(id)}`);
}

export const feedingQueryOptions = (id: string) =>
  queryOptions({ queryKey: feedingKey(id), queryFn: () => getFeeding(id) });

export function useFeeding(id: string) {
  return useQuery(feedingQueryOptions(id));
}
