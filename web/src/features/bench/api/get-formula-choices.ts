import type { FormulaListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { benchKeys } from './query-keys';

// The Bench's own small read of the formulas, for the picker (features do not share api files).
const PICKER_LIMIT = 100;

/** GET /api/formulas?limit=100 → the baker's formulas, newest change first. */
export function getFormulaChoices(): Promise<FormulaListResponse> {
  return api.get<FormulaListResponse>(`/formulas?limit=${PICKER_LIMIT}`);
}

export const formulaChoicesQueryOptions = () =>
  queryOptions({ queryKey: benchKeys.formulas, queryFn: getFormulaChoices });

export function useFormulaChoices() {
  return useQuery(formulaChoicesQueryOptions());
}
