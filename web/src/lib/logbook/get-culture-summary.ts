import type { CultureSummary } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from './query-keys';

/** GET /api/cultures/:id/summary → CultureSummary: state, running rise, forecast, kinetics. */
export function getCultureSummary(id: string): Promise<CultureSummary> {
  return api.get<CultureSummary>(`/cultures/${encodeURIComponent(id)}/summary`);
}

export const cultureSummaryQueryOptions = (id: string) =>
  queryOptions({
    queryKey: logbookKeys.summary(id),
    queryFn: () => getCultureSummary(id),
    // A countdown on the Shelf should move on while the phone sits on the counter.
    refetchInterval: 5 * 60_000,
    retry: 1,
  });

export function useCultureSummary(id: string) {
  return useQuery(cultureSummaryQueryOptions(id));
}
