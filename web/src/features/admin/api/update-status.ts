import type { Account, AdminAccount } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { adminAccountsQueryKey } from './get-accounts';

export interface UpdateStatusInput {
  account: Account;
  disabled: boolean;
}

/** PATCH /api/admin/accounts/:id/status → 200 AdminAccount; disabling signs the account out everywhere. */
export function updateStatus({ account, disabled }: UpdateStatusInput): Promise<AdminAccount> {
  return api.patch<AdminAccount>(`/admin/accounts/${encodeURIComponent(account.id)}/status`, { disabled });
}

export function useUpdateStatus() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStatus,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminAccountsQueryKey }),
  });
}
