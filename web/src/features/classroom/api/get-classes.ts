import type { ClassListResponse, PageQuery } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, searchOf } from './query-keys';

/** GET /api/classes → the classes the viewer teaches and the ones they are a current member of. */
export function getClasses(query: PageQuery): Promise<ClassListResponse> {
  return api.get<ClassListResponse>(`/classes${searchOf(query)}`);
}

export const classesQueryOptions = (query: PageQuery) =>
  queryOptions({ queryKey: classKeys.list({ ...query }), queryFn: () => getClasses(query) });

export function useClasses(query: PageQuery) {
  return useQuery(classesQueryOptions(query));
}
