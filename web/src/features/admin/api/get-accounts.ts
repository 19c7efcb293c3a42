import type { AccountListResponse } from '@peakwise/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface AccountsPage {
  limit: number;
  offset: number;
}

/** Prefix of every admin account-list page; invalidate it to refresh them all. */
export const adminAccountsQueryKey = ['admin', 'accounts'] as const;

/** GET /api/admin/accounts?limit=&offset= (admin only; 403 otherwise). */
export function getAccounts({ limit, offset }: AccountsPage): Promise<AccountListResponse> {
  const query = new URLSearchParams({ limit: String(limit), offset: String(offset) });
  return api.get<AccountListResponse>(`/admin/accounts?${query.toString()}`);
}

export function accountsQueryOptions(page: AccountsPage) {
  return queryOptions({
    queryKey: [...adminAccountsQueryKey, page],
    queryFn: () => getAccounts(page),
    // Keep the current rows on screen while the next page loads, instead of a blank table.
    placeholderData: keepPreviousData,
  });
}

export function useAccounts(page: AccountsPage) {
  return useQuery(accountsQueryOptions(page));
}
