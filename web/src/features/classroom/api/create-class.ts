import type { BakingClass, CreateClassRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys } from './query-keys';

/** POST /api/classes → 201 BakingClass (instructors and admins). */
export function createClass(body: CreateClassRequest, headers: Record<string, string>): Promise<BakingClass> {
  return api.post<BakingClass>('/classes', body, headers);
}

export function useCreateClass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateClassRequest; headers: Record<string, string> }) =>
      createClass(body, headers),
    onSuccess: (created) => {
      // The page opens the new class next: no second trip for what the answer already holds.
      queryClient.setQueryData(classKeys.class(created.id), created);
      return queryClient.invalidateQueries({ queryKey: classKeys.lists });
    },
  });
}
