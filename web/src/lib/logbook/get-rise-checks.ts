import type { RiseCheckListResponse } from '@peakwise/shared';
import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from './query-keys';

/** GET /api/feedings/:feedingId/rise-checks → Paged<RiseCheck> (a feeding's handful, all at once). */
export function getRiseChecks(feedingId: string): Promise<RiseCheckListResponse> {
  return api.get<RiseCheckListResponse>(`/feedings/${encodeURIComponent(feedingId)}/rise-checks?limit=200`);
}

// Under the logbook's root key, so a new rise check refreshes these too.
export const riseChecksQueryOptions = (feedingId: string) =>
  queryOptions({
    queryKey: [...logbookKeys.all, 'feeding', feedingId, 'rise-checks'] as const,
    queryFn: () => getRiseChecks(feedingId),
  });
