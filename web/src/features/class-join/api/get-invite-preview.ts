import type { ClassJoinPreview } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classJoinKeys } from './query-keys';

/** GET /api/class-invites/:token → ClassJoinPreview (410 used/expired/revoked, 403 another address, 404). */
export function getInvitePreview(token: string): Promise<ClassJoinPreview> {
  return api.get<ClassJoinPreview>(`/class-invites/${encodeURIComponent(token)}`);
}

export const invitePreviewQueryOptions = (token: string) =>
  queryOptions({ queryKey: classJoinKeys.invite(token), queryFn: () => getInvitePreview(token) });

export function useInvitePreview(token: string) {
  return useQuery(invitePreviewQueryOptions(token));
}
