import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

/** DELETE /api/rise-checks/:id → 204. */
export function deleteRiseCheck(id: string): Promise<void> {
  return api.delete<void>(`/rise-checks/${encodeURIComponent(id)}`);
}

export function useDeleteRiseCheck() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => deleteRiseCheck(id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
