import type { Account } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '../api-client';

/** The one key for "who is signed in"; sign-in, sign-up, sign-out and profile edits write to it. */
export const currentAccountQueryKey = ['account', 'current'] as const;

/** GET /api/account. Being signed out is a normal state, not an error: it resolves to null. */
export async function getCurrentAccount(): Promise<Account | null> {
  try {
    return await api.get<Account>('/account');
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const currentAccountQueryOptions = queryOptions({
  queryKey: currentAccountQueryKey,
  queryFn: getCurrentAccount,
});

export function useCurrentAccount() {
  return useQuery(currentAccountQueryOptions);
}
