import type { Account } from '@peakwise/shared';
import { useCurrentAccount } from './current-account';

/**
 * The signed-in account, for components rendered inside <RequireAuth>. The guard only renders
 * its children once the account is known, so a missing account here is a programming error.
 */
export function useSignedInAccount(): Account {
  const { data } = useCurrentAccount();
  if (!data) throw new Error('useSignedInAccount() used outside <RequireAuth>');
  return data;
}
