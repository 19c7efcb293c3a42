import type { RiseCheck, UpdateRiseCheckRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

/** PATCH /api/rise-checks/:id → RiseCheck; only the fields sent change. */
export function updateRiseCheck(id: string, body: UpdateRiseCheckRequest): Promise<RiseCheck> {
  return api.patch<RiseCheck>(`/rise-checks/${encodeURIComponent(id)}`, body);
}

export function useUpdateRiseCheck() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body: UpdateRiseCheckRequest }) => updateRiseCheck(id, body),
    // A corrected reading refits the curve: summary, charts and Shelf ask again.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
