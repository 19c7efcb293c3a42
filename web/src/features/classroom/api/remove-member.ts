import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** DELETE /api/classes/:classId/members/:studentId → 204; the student's sharing with the class ends. */
export function removeMember(classId: string, studentId: string): Promise<void> {
  return api.delete<void>(`${classPath(classId)}/members/${encodeURIComponent(studentId)}`);
}

export function useRemoveMember(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (studentId: string) => removeMember(classId, studentId),
    // Members, roster, chart and the member count all change.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.all }),
  });
}
