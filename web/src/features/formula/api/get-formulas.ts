import type { FormulaListQuery, FormulaListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { formulaKeys } from './query-keys';

/** GET /api/formulas → Paged<FormulaListItem>, newest change first. */
export function getFormulas(query: FormulaListQuery): Promise<FormulaListResponse> {
  const params = new URLSearchParams();
  if (query.limit !== undefined) params.set('limit', String(query.limit));
  if (query.offset !== undefined) params.set('offset', String(query.offset));
  return api.get<FormulaListResponse>(`/formulas?${params.toString()}`);
}

export const formulasQueryOptions = (query: FormulaListQuery) =>
  queryOptions({ queryKey: formulaKeys.list({ ...query }), queryFn: () => getFormulas(query) });

export function useFormulas(query: FormulaListQuery) {
  return useQuery(formulasQueryOptions(query));
}
