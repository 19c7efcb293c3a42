import type { CreateCultureRequest, Culture } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from './query-keys';

/** POST /api/cultures → 201 Culture. */
export function createCulture(body: CreateCultureRequest, headers: Record<string, string>): Promise<Culture> {
  return api.post<Culture>('/cultures', body, headers);
}

export function useCreateCulture() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: CreateCultureRequest; headers: Record<string, string> }) =>
      createCulture(body, headers),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
