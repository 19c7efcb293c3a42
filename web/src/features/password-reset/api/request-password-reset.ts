import type { PasswordResetRequest, PasswordResetRequested } from '@peakwise/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/auth/password-reset → 202, the same whether or not the address has an account. */
export function requestPasswordReset(body: PasswordResetRequest): Promise<PasswordResetRequested> {
  return api.post<PasswordResetRequested>('/auth/password-reset', body);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
