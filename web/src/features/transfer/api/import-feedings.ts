import type { ImportRequest, ImportResult } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from '@/lib/logbook/query-keys';

/** POST /api/cultures/:id/import → ImportResult; a 400 naming "line N: column" when any row is refused. */
export function importFeedings(
  cultureId: string,
  body: ImportRequest,
  headers: Record<string, string>,
): Promise<ImportResult> {
  return api.post<ImportResult>(`/cultures/${encodeURIComponent(cultureId)}/import`, body, headers);
}

export function useImportFeedings(cultureId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, headers }: { body: ImportRequest; headers: Record<string, string> }) =>
      importFeedings(cultureId, body, headers),
    // A real import changes the feedings, the Shelf card and the culture's kinetics; a dry run nothing.
    onSuccess: (result) => {
      if (!result.dryRun) void queryClient.invalidateQueries({ queryKey: logbookKeys.all });
    },
  });
}
