import type { PhotoListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys, photosPath, type PhotoList } from './query-keys';

/** A log's photos come in one page: a feeding or bake has a handful, a culture's strip a few dozen. */
export const PHOTO_LIST_LIMIT = 100;

/**
 * GET /api/feedings/:id/photos, /api/plans/:id/photos or /api/cultures/:id/photos → Paged<Photo>,
 * oldest first. The same routes answer the owner and the class's instructor.
 */
export function getPhotos(list: PhotoList): Promise<PhotoListResponse> {
  return api.get<PhotoListResponse>(`${photosPath(list)}?limit=${PHOTO_LIST_LIMIT}`);
}

export const photosQueryOptions = (list: PhotoList) =>
  queryOptions({ queryKey: photoKeys.list(list), queryFn: () => getPhotos(list) });

export function usePhotos(list: PhotoList) {
  return useQuery(photosQueryOptions(list));
}
