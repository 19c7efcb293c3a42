import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { formulaKeys } from './query-keys';

/** DELETE /api/formulas/:id → 204. */
export function deleteFormula(id: string): Promise<void> {
  return api.delete<void>(`/formulas/${encodeURIComponent(id)}`);
}

export function useDeleteFormula() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteFormula,
    // Only the lists: refetching the deleted formula itself would flash a 404 before the page moves on.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: formulaKeys.lists }),
  });
}
