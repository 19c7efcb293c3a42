import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys } from './query-keys';

/** DELETE /api/photos/:photoId → 204 (owner only); the stored images go with it. */
export function deletePhoto(photoId: string): Promise<void> {
  return api.delete<void>(`/photos/${encodeURIComponent(photoId)}`);
}

export function useDeletePhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKeys.all }),
  });
}
