import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { feedingKey } from './get-feeding';

/** DELETE /api/feedings/:id → 204; its rise checks and temperatures go with it. */
export function deleteFeeding(id: string): Promise<void> {
  return api.delete<void>(`/feedings/${encodeURIComponent(id)}`);
}

/** True for the deleted feeding's own queries, which would only answer 404 if asked again. */
export function isUnderFeeding(queryKey: readonly unknown[], id: string): boolean {
  return feedingKey(id).every((part, i) => queryKey[i] === part);
}

export function useDeleteFeeding(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteFeeding(id),
    onSuccess: () =>
      queryClient.invalidateQueries({
        queryKey: logbookKeys.all,
        predicate: (query) => !isUnderFeeding(query.queryKey, id),
      }),
  });
}
