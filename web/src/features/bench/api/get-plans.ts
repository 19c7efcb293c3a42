import type { BakePlanListQuery, BakePlanListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { benchKeys } from './query-keys';

/** GET /api/plans → Paged<BakePlanListItem>, optionally of one status. */
export function getPlans(query: BakePlanListQuery): Promise<BakePlanListResponse> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined) params.set(key, String(value));
  }
  return api.get<BakePlanListResponse>(`/plans?${params.toString()}`);
}

export const plansQueryOptions = (query: BakePlanListQuery) =>
  queryOptions({ queryKey: benchKeys.list({ ...query }), queryFn: () => getPlans(query) });

export function usePlans(query: BakePlanListQuery) {
  return useQuery(plansQueryOptions(query));
}
