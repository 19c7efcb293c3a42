import type { RiseCheckListResponse } from '@peakwise/shared';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** GET /api/classes/:classId/feedings/:feedingId/rise-checks → a student feeding's rise checks, all at once. */
export function getClassRiseChecks(classId: string, feedingId: string): Promise<RiseCheckListResponse> {
  return api.get<RiseCheckListResponse>(
    `${classPath(classId)}/feedings/${encodeURIComponent(feedingId)}/rise-checks?limit=200`,
  );
}

export const classRiseChecksQueryKey = (classId: string, feedingId: string) =>
  [...classKeys.logs(classId), 'feeding', feedingId, 'rise-checks'] as const;
