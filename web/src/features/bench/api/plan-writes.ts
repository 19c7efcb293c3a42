import type {
  BakePlanView,
  CheckedStep,
  CheckOffStepRequest,
  DoughReading,
  CreateDoughReadingRequest,
  FinishBakePlanRequest,
  UpdateBakePlanRequest,
} from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useCurrentAccount } from '@/lib/auth/current-account';
import { sendOrHold } from '@/lib/outbox/outbox';
import { benchKeys } from './query-keys';

// The writes on one plan. Each refreshes the plan (re-planned by the server on read) and the list
// through `benchKeys.all`.
const path = (id: string, rest = '') => `/plans/${encodeURIComponent(id)}${rest}`;

/** POST /api/plans/:id/steps/:stepId/done → 201 CheckedStep. */
export const checkOffStep = (id: string, stepId: string, body: CheckOffStepRequest, headers: Record<string, string>) =>
  api.post<CheckedStep>(path(id, `/steps/${encodeURIComponent(stepId)}/done`), body, headers);

/** DELETE /api/plans/:id/steps/:stepId/done → 204, the check-off undone. */
export const undoStep = (id: string, stepId: string) =>
  api.delete<void>(path(id, `/steps/${encodeURIComponent(stepId)}/done`));

/** POST /api/plans/:id/readings → 201 DoughReading. */
export const createReading = (id: string, body: CreateDoughReadingRequest, headers: Record<string, string>) =>
  api.post<DoughReading>(path(id, '/readings'), body, headers);

/** DELETE /api/plans/:id/readings/:readingId → 204. */
export const deleteReading = (id: string, readingId: string) =>
  api.delete<void>(path(id, `/readings/${encodeURIComponent(readingId)}`));

/** POST /api/plans/:id/finish → BakePlanView (finishing again edits the record). */
export const finishPlan = (id: string, body: FinishBakePlanRequest, headers: Record<string, string>) =>
  api.post<BakePlanView>(path(id, '/finish'), body, headers);

/** PATCH /api/plans/:id (rename, cancel). */
export const updatePlan = (id: string, body: UpdateBakePlanRequest) => api.patch<BakePlanView>(path(id), body);

function useRefreshing<V>(fn: (vars: V) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.all }),
  });
}

type Headers = { headers: Record<string, string> };

/** Resolves to the check-off, or undefined when it was kept in the outbox to send later. */
export function useCheckOffStep(id: string) {
  const queryClient = useQueryClient();
  const accountId = useCurrentAccount().data?.id;
  return useMutation({
    // Offline the check-off goes to the outbox instead of waiting for a signal.
    networkMode: 'always',
    mutationFn: ({ stepId, body, headers }: { stepId: string; body: CheckOffStepRequest } & Headers) =>
      sendOrHold(
        {
          accountId,
          kind: 'step-done',
          path: path(id, `/steps/${encodeURIComponent(stepId)}/done`),
          body,
          headers,
          openPath: `/bench/${encodeURIComponent(id)}`,
          // Without times the server would take the moment it arrives as the moment it was done.
          stamped: (savedAt) => (body.startedAt || body.endedAt ? body : { startedAt: savedAt, endedAt: savedAt }),
        },
        (h) => checkOffStep(id, stepId, body, h),
      ),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: benchKeys.all }),
  });
}

export function useUndoStep(id: string) {
  return useRefreshing((stepId: string) => undoStep(id, stepId));
}

export function useCreateReading(id: string) {
  return useRefreshing(({ body, headers }: { body: CreateDoughReadingRequest } & Headers) =>
    createReading(id, body, headers),
  );
}

export function useDeleteReading(id: string) {
  return useRefreshing((readingId: string) => deleteReading(id, readingId));
}

export function useFinishPlan(id: string) {
  return useRefreshing(({ body, headers }: { body: FinishBakePlanRequest } & Headers) => finishPlan(id, body, headers));
}

export function useUpdatePlan(id: string) {
  return useRefreshing((body: UpdateBakePlanRequest) => updatePlan(id, body));
}
