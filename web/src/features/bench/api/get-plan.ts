import type { BakePlanView } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { benchKeys } from './query-keys';

/** GET /api/plans/:id → BakePlanView, re-planned by the server at the moment of the request. */
export function getPlan(id: string): Promise<BakePlanView> {
  return api.get<BakePlanView>(`/plans/${encodeURIComponent(id)}`);
}

// The live plan moves with the clock (an overdue step slides to now), so it is fetched again
// every few minutes while the page is open.
export const planQueryOptions = (id: string) =>
  queryOptions({ queryKey: benchKeys.plan(id), queryFn: () => getPlan(id), refetchInterval: 5 * 60_000 });

export function usePlan(id: string) {
  return useQuery(planQueryOptions(id));
}

/** Where the calendar file of a plan downloads from (a plain link: the browser saves it). */
export function calendarUrl(id: string): string {
  return `/api/plans/${encodeURIComponent(id)}/calendar.ics`;
}
