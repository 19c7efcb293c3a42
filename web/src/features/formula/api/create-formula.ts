import type { CreateFormulaRequest, Formula } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { formulaKeys } from './query-keys';

/** POST /api/formulas → 201 Formula. */
export function createFormula(body: CreateFormulaRequest, headers: Record<string, string>): Promise<Formula> {
  return api.post<Formula>('/formulas', body, headers);
}

export function useCreateFormula() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateFormulaRequest; headers: Record<string, string> }) =>
      createFormula(body, headers),
    onSuccess: (formula) => {
      // The editor opens the saved formula next: no second trip for what the answer already holds.
      queryClient.setQueryData(formulaKeys.detail(formula.id), formula);
      return queryClient.invalidateQueries({ queryKey: formulaKeys.lists });
    },
  });
}
