import type { Account, Role } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { currentAccountQueryKey } from '@/lib/auth/current-account';
import { adminAccountsQueryKey } from './get-accounts';

export interface UpdateRoleInput {
  accountId: string;
  role: Role;
}

/** PATCH /api/admin/accounts/:id/role → 200 Account. */
export function updateRole({ accountId, role }: UpdateRoleInput): Promise<Account> {
  return api.patch<Account>(`/admin/accounts/${encodeURIComponent(accountId)}/role`, { role });
}

export function useUpdateRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRole,
    onSuccess: async (account) => {
      const current = queryClient.getQueryData<Account | null>(currentAccountQueryKey);
      if (current?.id === account.id) queryClient.setQueryData(currentAccountQueryKey, account);
      await queryClient.invalidateQueries({ queryKey: adminAccountsQueryKey });
    },
  });
}
