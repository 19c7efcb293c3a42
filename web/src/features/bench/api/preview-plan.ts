import type { BakePlanPreview, PreviewBakePlanRequest } from '@peakwise/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/plans/preview → BakePlanPreview; nothing is stored, so nothing to invalidate. */
export function previewPlan(body: PreviewBakePlanRequest, headers: Record<string, string>): Promise<BakePlanPreview> {
  return api.post<BakePlanPreview>('/plans/preview', body, headers);
}

export function usePreviewPlan() {
  return useMutation({
    mutationFn: ({ body, headers }: { body: PreviewBakePlanRequest; headers: Record<string, string> }) =>
      previewPlan(body, headers),
  });
}
