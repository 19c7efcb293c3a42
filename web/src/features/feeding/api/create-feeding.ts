import type { CreateFeedingRequest, Feeding } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useCurrentAccount } from '@/lib/auth/current-account';
import { formatWeights } from '@/lib/format/units';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { sendOrHold } from '@/lib/outbox/outbox';

const feedingsPath = (cultureId: string) => `/cultures/${encodeURIComponent(cultureId)}/feedings`;

/** POST /api/cultures/:cultureId/feedings → 201 Feeding. */
export function createFeeding(
  cultureId: string,
  body: CreateFeedingRequest,
  headers: Record<string, string>,
): Promise<Feeding> {
  return api.post<Feeding>(feedingsPath(cultureId), body, headers);
}

/** Resolves to the new feeding, or undefined when it was kept in the outbox to send later. */
export function useCreateFeeding(cultureId: string) {
  const queryClient = useQueryClient();
  const account = useCurrentAccount().data;
  return useMutation({
    // Offline the write goes to the outbox instead of waiting for a signal.
    networkMode: 'always',
    mutationFn: ({ body, headers }: { body: CreateFeedingRequest; headers: Record<string, string> }) =>
      sendOrHold(
        {
          accountId: account?.id,
          kind: 'feeding',
          path: feedingsPath(cultureId),
          body,
          headers,
          openPath: `/cultures/${encodeURIComponent(cultureId)}`,
          detail: [
            body.starterG !== undefined && body.flourG !== undefined && body.waterG !== undefined
              ? formatWeights([body.starterG, body.flourG, body.waterG], account?.unitSystem ?? 'metric')
              : body.ratio,
            body.notes,
          ]
            .filter(Boolean)
            .join(' · '),
          stamped: (savedAt) => ({ ...body, fedAt: body.fedAt ?? savedAt }),
        },
        (h) => createFeeding(cultureId, body, h),
      ),
    // The summary (state, first prediction) and the feedings table change with a new feeding.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
