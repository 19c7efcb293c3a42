import type { Formula, UpdateFormulaRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { formulaKeys } from './query-keys';

/** PATCH /api/formulas/:id → Formula. */
export function updateFormula(id: string, body: UpdateFormulaRequest): Promise<Formula> {
  return api.patch<Formula>(`/formulas/${encodeURIComponent(id)}`, body);
}

export function useUpdateFormula(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateFormulaRequest) => updateFormula(id, body),
    onSuccess: (formula) => {
      queryClient.setQueryData(formulaKeys.detail(id), formula);
      return queryClient.invalidateQueries({ queryKey: formulaKeys.all });
    },
  });
}
