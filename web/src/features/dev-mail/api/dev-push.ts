import type { DevPushListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** GET /api/dev/push → what the local fake push service received, decrypted, newest first (404 in production). */
export function fetchDevPush(): Promise<DevPushListResponse> {
  return api.get<DevPushListResponse>('/dev/push');
}

export const devPushQuery = queryOptions({
  queryKey: ['dev-push'],
  queryFn: fetchDevPush,
  refetchInterval: 5_000,
  retry: false,
});

export function useDevPush() {
  return useQuery(devPushQuery);
}
