import type { ComputeFormulaRequest, FormulaComputed } from '@peakwise/shared';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';
import { formulaKeys } from './query-keys';

/** POST /api/formulas/compute → the computed view of an unsaved formula (stores nothing). */
export function computeFormula(body: ComputeFormulaRequest): Promise<FormulaComputed> {
  return api.post<FormulaComputed>('/formulas/compute', body);
}

/**
 * The editor's live view. Keyed by the request, so typing back to an earlier formula is answered
 * from the cache; the previous answer stays on screen while the next one is on its way.
 */
export function useComputedFormula(body: ComputeFormulaRequest | null) {
  return useQuery({
    queryKey: formulaKeys.compute(body),
    queryFn: () => computeFormula(body!),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    // A 400 is an answer about the formula (shown at its line), not a hiccup worth retrying.
    retry: (count, error) => !isApiError(error) || (error.status !== 400 && count < 2),
  });
}
