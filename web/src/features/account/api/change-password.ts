import type { ChangePasswordRequest } from '@peakwise/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** POST /api/account/password → 204; 400 naming `currentPassword` or `newPassword`. */
export function changePassword(body: ChangePasswordRequest): Promise<void> {
  return api.post<void>('/account/password', body);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
