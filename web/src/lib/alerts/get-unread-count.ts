import type { UnreadAlertCount } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ALERT_POLL_MS, alertKeys } from './query-keys';

/** GET /api/alerts/unread-count → { unread }. */
export function getUnreadCount(): Promise<UnreadAlertCount> {
  return api.get<UnreadAlertCount>('/alerts/unread-count');
}

export const unreadCountQueryOptions = () =>
  queryOptions({ queryKey: alertKeys.unread, queryFn: getUnreadCount, refetchInterval: ALERT_POLL_MS });

/** Polled, so the bell lights up within seconds of an alert coming due, on any page. */
export function useUnreadCount() {
  return useQuery(unreadCountQueryOptions());
}
