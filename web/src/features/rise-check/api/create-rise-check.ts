import type { CreateRiseCheckRequest, RiseCheck } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useCurrentAccount } from '@/lib/auth/current-account';
import { logbookKeys } from '@/lib/logbook/query-keys';
import { sendOrHold } from '@/lib/outbox/outbox';

const riseChecksPath = (feedingId: string) => `/feedings/${encodeURIComponent(feedingId)}/rise-checks`;

/** POST /api/feedings/:feedingId/rise-checks → 201 RiseCheck. */
export function createRiseCheck(
  feedingId: string,
  body: CreateRiseCheckRequest,
  headers: Record<string, string>,
): Promise<RiseCheck> {
  return api.post<RiseCheck>(riseChecksPath(feedingId), body, headers);
}

/** Resolves to the rise check, or undefined when it was kept in the outbox to send later. */
export function useCreateRiseCheck(feedingId: string) {
  const queryClient = useQueryClient();
  const accountId = useCurrentAccount().data?.id;
  return useMutation({
    // Offline the write goes to the outbox instead of waiting for a signal.
    networkMode: 'always',
    mutationFn: ({ body, headers }: { body: CreateRiseCheckRequest; headers: Record<string, string> }) =>
      sendOrHold(
        {
          accountId,
          kind: 'rise-check',
          path: riseChecksPath(feedingId),
          body,
          headers,
          openPath: `/feedings/${encodeURIComponent(feedingId)}`,
          stamped: (savedAt) => ({ ...body, takenAt: body.takenAt ?? savedAt }),
        },
        (h) => createRiseCheck(feedingId, body, h),
      ),
    // A new reading refits the curve: the summary must be asked again.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: logbookKeys.all }),
  });
}
