import type { DeleteAccountRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { endSession, signOutMutationKey } from '@/lib/auth/session';

/** POST /api/account/delete → 204: the account and its logs are gone, the session too; 400 naming `password`. */
export function deleteAccount(body: DeleteAccountRequest): Promise<void> {
  return api.post<void>('/account/delete', body);
}

export function useDeleteAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    // Counted as signing out on purpose: the guard sends the page to sign-in without "session expired".
    mutationKey: signOutMutationKey,
    mutationFn: deleteAccount,
    onSuccess: () => endSession(queryClient),
  });
}
