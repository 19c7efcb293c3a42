import type { Photo, UpdatePhotoRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys } from './query-keys';

/** PATCH /api/photos/:photoId {caption} (owner only; null clears it). */
export function updatePhoto(photoId: string, body: UpdatePhotoRequest): Promise<Photo | undefined> {
  return api.patch<Photo | undefined>(`/photos/${encodeURIComponent(photoId)}`, body);
}

export function useUpdatePhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ photoId, body }: { photoId: string; body: UpdatePhotoRequest }) => updatePhoto(photoId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: photoKeys.all }),
  });
}
