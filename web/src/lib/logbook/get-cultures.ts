import type { CultureListQuery, CultureListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from './query-keys';

/** GET /api/cultures → Paged<Culture>. */
export function getCultures(query: CultureListQuery): Promise<CultureListResponse> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined) params.set(key, String(value));
  }
  return api.get<CultureListResponse>(`/cultures?${params.toString()}`);
}

export const culturesQueryOptions = (query: CultureListQuery) =>
  queryOptions({ queryKey: logbookKeys.list({ ...query }), queryFn: () => getCultures(query) });

export function useCultures(query: CultureListQuery) {
  return useQuery(culturesQueryOptions(query));
}
