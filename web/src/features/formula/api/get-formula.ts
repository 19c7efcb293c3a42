import type { Formula } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { formulaKeys } from './query-keys';

/** GET /api/formulas/:id → Formula with its computed view. */
export function getFormula(id: string): Promise<Formula> {
  return api.get<Formula>(`/formulas/${encodeURIComponent(id)}`);
}

export const formulaQueryOptions = (id: string) =>
  queryOptions({ queryKey: formulaKeys.detail(id), queryFn: () => getFormula(id) });

export function useFormula(id: string | undefined) {
  return useQuery({ ...formulaQueryOptions(id ?? ''), enabled: id !== undefined });
}
