import type { AlertListQuery, AlertListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ALERT_POLL_MS, alertKeys } from '@/lib/alerts/query-keys';

/** GET /api/alerts → Paged<Alert>, unread first. */
export function listAlerts(query: AlertListQuery): Promise<AlertListResponse> {
  const params = new URLSearchParams();
  if (query.limit !== undefined) params.set('limit', String(query.limit));
  if (query.offset !== undefined) params.set('offset', String(query.offset));
  return api.get<AlertListResponse>(`/alerts?${params.toString()}`);
}

export const alertsQueryOptions = (query: AlertListQuery) =>
  queryOptions({
    queryKey: alertKeys.list({ ...query }),
    queryFn: () => listAlerts(query),
    refetchInterval: ALERT_POLL_MS,
  });

export function useAlerts(query: AlertListQuery) {
  return useQuery(alertsQueryOptions(query));
}
