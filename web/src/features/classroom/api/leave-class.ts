import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** POST /api/classes/:classId/leave → 204; sharing with the class's instructor ends at once. */
export function leaveClass(classId: string): Promise<void> {
  return api.post<void>(`${classPath(classId)}/leave`);
}

export function useLeaveClass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: leaveClass,
    onSuccess: (_, classId) => {
      // The class is no longer the viewer's: drop it rather than refetch a 404.
      queryClient.removeQueries({ queryKey: classKeys.class(classId) });
      return queryClient.invalidateQueries({ queryKey: classKeys.lists });
    },
  });
}
