import type { Account } from '@peakwise/shared';
import { hashKey, type QueryClient } from '@tanstack/react-query';
import { currentAccountQueryKey } from './current-account';

/** Sign-out mutations carry this key, so guards can tell signing out from a session expiring. */
export const signOutMutationKey = ['auth', 'sign-out'] as const;

const currentAccountHash = hashKey(currentAccountQueryKey);

// Cached data belongs to one person. When the person at this device changes, drop everything
// except the current-account entry (route guards are subscribed to it) and then set that.
function forgetOtherQueries(queryClient: QueryClient): void {
  queryClient.removeQueries({ predicate: (query) => query.queryHash !== currentAccountHash });
}

export function startSession(queryClient: QueryClient, account: Account): void {
  forgetOtherQueries(queryClient);
  // An old sign-out must not make a later expired session look like a deliberate one.
  const mutations = queryClient.getMutationCache();
  for (const m of mutations.findAll({ mutationKey: signOutMutationKey })) mutations.remove(m);
  queryClient.setQueryData(currentAccountQueryKey, account);
}

export function endSession(queryClient: QueryClient): void {
  forgetOtherQueries(queryClient);
  queryClient.setQueryData(currentAccountQueryKey, null);
}
