import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

/** DELETE /api/temperatures/:id → 204. */
export function deleteTemperature(id: string): Promise<void> {
  return api.delete<void>(`/temperatures/${encodeURIComponent(id)}`);
}

export function useDeleteTemperature() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => deleteTemperature(id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
