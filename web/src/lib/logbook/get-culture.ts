import type { Culture } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from './query-keys';

/** GET /api/cultures/:id → Culture (404 for someone else's). */
export function getCulture(id: string): Promise<Culture> {
  return api.get<Culture>(`/cultures/${encodeURIComponent(id)}`);
}

export const cultureQueryOptions = (id: string) =>
  queryOptions({ queryKey: logbookKeys.culture(id), queryFn: () => getCulture(id) });

export function useCulture(id: string) {
  return useQuery(cultureQueryOptions(id));
}
