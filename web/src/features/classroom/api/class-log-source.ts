import type { FeedingListQuery } from '@peakwise/shared';
import { classFeedingsQueryKey, getClassFeedings } from './get-class-feedings';
import { classRiseChecksQueryKey, getClassRiseChecks } from './get-class-rise-checks';

/**
 * A student culture's feedings and rise checks through the class's read-only routes, in the shape
 * the culture page's charts take (`source`), so the instructor sees the charts the student sees.
 */
export function classLogSource(classId: string, cultureId: string) {
  return {
    feedings: (query: FeedingListQuery) => ({
      queryKey: classFeedingsQueryKey(classId, cultureId, query),
      queryFn: () => getClassFeedings(classId, cultureId, query),
    }),
    riseChecks: (feedingId: string) => ({
      queryKey: classRiseChecksQueryKey(classId, feedingId),
      queryFn: () => getClassRiseChecks(classId, feedingId),
    }),
  };
}
