import type { PhotoListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys, photosPath, type PhotoList } from './query-keys';

/** The API's largest page: a feeding or bake has a handful, a culture's strip rarely more. */
export const PHOTO_LIST_LIMIT = 200;

/**
 * GET /api/feedings/:id/photos, /api/plans/:id/photos or /api/cultures/:id/photos → Paged<Photo>,
 * oldest first. The same routes answer the owner and the class's instructor. A list longer than
 * one page is asked again for its last page: the newest photos matter most.
 */
export async function getPhotos(list: PhotoList): Promise<PhotoListResponse> {
  const page = (offset: number) =>
    api.get<PhotoListResponse>(`${photosPath(list)}?limit=${PHOTO_LIST_LIMIT}&offset=${offset}`);
  const first = await page(0);
  return first.total > first.items.length ? page(first.total - PHOTO_LIST_LIMIT) : first;
}

export const photosQueryOptions = (list: PhotoList) =>
  queryOptions({
    queryKey: photoKeys.list(list),
    queryFn: () => getPhotos(list),
    // Deleting a feeding deletes its photos without touching these keys: the strip asks again on
    // every visit instead of showing a deleted photo from the cache.
    ...(list.type === 'culture' ? { staleTime: 0 } : {}),
  });

export function usePhotos(list: PhotoList) {
  return useQuery(photosQueryOptions(list));
}
