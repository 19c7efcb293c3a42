import type { PasswordResetConfirmRequest } from '@peakwise/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/auth/password-reset/confirm → 204; 400 naming `token` (expired, used) or `password`. */
export function confirmPasswordReset(body: PasswordResetConfirmRequest): Promise<void> {
  return api.post<void>('/auth/password-reset/confirm', body);
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
