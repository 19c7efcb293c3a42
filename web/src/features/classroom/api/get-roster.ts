import type { RosterQuery, RosterResponse } from '@peakwise/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath, searchOf } from './query-keys';

/** GET /api/classes/:classId/roster → one row per student culture, sorted, filtered and paged by the API. */
export function getRoster(classId: string, query: RosterQuery): Promise<RosterResponse> {
  return api.get<RosterResponse>(`${classPath(classId)}/roster${searchOf(query)}`);
}

export const rosterQueryOptions = (classId: string, query: RosterQuery) =>
  queryOptions({
    queryKey: classKeys.roster(classId, { ...query }),
    queryFn: () => getRoster(classId, query),
    // Sorting or paging keeps the old rows on screen until the new ones arrive.
    placeholderData: keepPreviousData,
    // The hours since feeding move on while the page is open in class.
    refetchInterval: 5 * 60_000,
  });

export function useRoster(classId: string, query: RosterQuery) {
  return useQuery(rosterQueryOptions(classId, query));
}

/**
 * GET /api/classes/:classId/roster.csv (every row, in the table's filter and order): a plain
 * download link, the session cookie goes along.
 */
export const rosterCsvUrl = (classId: string, query: Omit<RosterQuery, 'limit' | 'offset'>) =>
  `/api${classPath(classId)}/roster.csv${searchOf(query)}`;
