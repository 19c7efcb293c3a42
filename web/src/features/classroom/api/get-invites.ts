import type { ClassInviteListResponse, PageQuery } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath, searchOf } from './query-keys';

/** GET /api/classes/:classId/invites → the class's invitations with their status (instructor only). */
export function getInvites(classId: string, query: PageQuery): Promise<ClassInviteListResponse> {
  return api.get<ClassInviteListResponse>(`${classPath(classId)}/invites${searchOf(query)}`);
}

export const invitesQueryOptions = (classId: string, query: PageQuery) =>
  queryOptions({
    queryKey: [...classKeys.invites(classId), { ...query }] as const,
    queryFn: () => getInvites(classId, query),
  });

export function useInvites(classId: string, query: PageQuery) {
  return useQuery(invitesQueryOptions(classId, query));
}
