import type { DevMailListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** GET /api/dev/mail → what the local fake mail server caught, newest first (404 in production). */
export function fetchDevMail(): Promise<DevMailListResponse> {
  return api.get<DevMailListResponse>('/dev/mail');
}

export const devMailQuery = queryOptions({
  queryKey: ['dev-mail'],
  queryFn: fetchDevMail,
  // New alert mail should show up without a reload while someone watches the page.
  refetchInterval: 5_000,
  retry: false,
});

export function useDevMail() {
  return useQuery(devMailQuery);
}
