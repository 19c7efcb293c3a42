import type { ClassMemberListResponse, PageQuery } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath, searchOf } from './query-keys';

/** GET /api/classes/:classId/members → the current members (instructor only). */
export function getMembers(classId: string, query: PageQuery): Promise<ClassMemberListResponse> {
  return api.get<ClassMemberListResponse>(`${classPath(classId)}/members${searchOf(query)}`);
}

export const membersQueryOptions = (classId: string, query: PageQuery) =>
  queryOptions({
    queryKey: [...classKeys.members(classId), { ...query }] as const,
    queryFn: () => getMembers(classId, query),
  });

export function useMembers(classId: string, query: PageQuery) {
  return useQuery(membersQueryOptions(classId, query));
}
