import type { BakePlanView, CreateBakePlanRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { benchKeys } from './query-keys';

/** POST /api/plans → 201 BakePlanView. */
export function createPlan(body: CreateBakePlanRequest, headers: Record<string, string>): Promise<BakePlanView> {
  return api.post<BakePlanView>('/plans', body, headers);
}

export function useCreatePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateBakePlanRequest; headers: Record<string, string> }) =>
      createPlan(body, headers),
    onSuccess: (plan) => {
      queryClient.setQueryData(benchKeys.plan(plan.id), plan);
      return queryClient.invalidateQueries({ queryKey: benchKeys.all });
    },
  });
}
