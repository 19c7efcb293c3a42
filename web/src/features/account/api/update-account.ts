import type { Account, UpdateAccountRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { currentAccountQueryKey } from '@/lib/auth/current-account';

/** PATCH /api/account → 200 Account. Send only what changed. */
export function updateAccount(body: UpdateAccountRequest): Promise<Account> {
  return api.patch<Account>('/account', body);
}

export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAccount,
    // The answer is the new account: the app bar and greeting update without a refetch.
    onSuccess: (account) => queryClient.setQueryData(currentAccountQueryKey, account),
  });
}
