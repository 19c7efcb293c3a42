import type { AlertPreferences, UpdateAlertPreferencesRequest } from '@peakwise/shared';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { alertKeys } from '@/lib/alerts/query-keys';

/** GET /api/account/alert-preferences → AlertPreferences (the defaults until first saved). */
export function getAlertPreferences(): Promise<AlertPreferences> {
  return api.get<AlertPreferences>('/account/alert-preferences');
}

/** PATCH /api/account/alert-preferences → 200 AlertPreferences. */
export function updateAlertPreferences(body: UpdateAlertPreferencesRequest): Promise<AlertPreferences> {
  return api.patch<AlertPreferences>('/account/alert-preferences', body);
}

export const alertPreferencesQueryOptions = () =>
  queryOptions({ queryKey: alertKeys.preferences, queryFn: getAlertPreferences });

export function useAlertPreferences() {
  return useQuery(alertPreferencesQueryOptions());
}

export function useUpdateAlertPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAlertPreferences,
    onSuccess: (prefs) => queryClient.setQueryData(alertKeys.preferences, prefs),
  });
}
