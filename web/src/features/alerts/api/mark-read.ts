import type { Alert, ReadAllAlertsResponse } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { alertKeys } from '@/lib/alerts/query-keys';

/** POST /api/alerts/:id/read → 200 Alert (keeps the first read time). */
export function markAlertRead(id: string): Promise<Alert> {
  return api.post<Alert>(`/alerts/${id}/read`);
}

/** POST /api/alerts/read-all → 200 { marked }. */
export function markAllAlertsRead(): Promise<ReadAllAlertsResponse> {
  return api.post<ReadAllAlertsResponse>('/alerts/read-all');
}

export function useMarkAlertRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markAlertRead,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alertKeys.all }),
  });
}

export function useMarkAllAlertsRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markAllAlertsRead,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alertKeys.all }),
  });
}
