import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { benchKeys } from './query-keys';

/** DELETE /api/plans/:id/kitchen-temperatures → 204: the logger's series is gone, the forecast goes back. */
export const clearKitchen = (id: string) => api.delete<void>(`/plans/${encodeURIComponent(id)}/kitchen-temperatures`);

export function useClearKitchen(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => clearKitchen(id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.all }),
  });
}
