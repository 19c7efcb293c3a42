import type { BakingClass, UpdateClassRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** PATCH /api/classes/:classId → BakingClass; `joinCode: true` makes a new code, `false` turns it off. */
export function updateClass(classId: string, body: UpdateClassRequest): Promise<BakingClass> {
  return api.patch<BakingClass>(classPath(classId), body);
}

export function useUpdateClass(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateClassRequest) => updateClass(classId, body),
    onSuccess: (updated) => {
      queryClient.setQueryData(classKeys.class(classId), updated);
      return queryClient.invalidateQueries({ queryKey: classKeys.lists });
    },
  });
}
