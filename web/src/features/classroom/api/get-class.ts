import type { BakingClass } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** GET /api/classes/:classId → BakingClass (404 for a class the viewer neither teaches nor is in). */
export function getClass(classId: string): Promise<BakingClass> {
  return api.get<BakingClass>(classPath(classId));
}

export const classQueryOptions = (classId: string) =>
  queryOptions({ queryKey: classKeys.class(classId), queryFn: () => getClass(classId) });

export function useClass(classId: string) {
  return useQuery(classQueryOptions(classId));
}
