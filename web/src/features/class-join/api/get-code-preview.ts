import type { ClassJoinPreview } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classJoinKeys } from './query-keys';

/** GET /api/class-join/:code → ClassJoinPreview (404 for a code no class has, or one turned off). */
export function getCodePreview(code: string): Promise<ClassJoinPreview> {
  return api.get<ClassJoinPreview>(`/class-join/${encodeURIComponent(code)}`);
}

export const codePreviewQueryOptions = (code: string) =>
  queryOptions({ queryKey: classJoinKeys.code(code), queryFn: () => getCodePreview(code) });

/** Asks only once the code is complete (`code` null until then). */
export function useCodePreview(code: string | null) {
  return useQuery({ ...codePreviewQueryOptions(code ?? ''), enabled: code !== null });
}
