import { useMutation, useMutationState, useQueryClient } from '@tanstack/react-query';
import { api, isApiError } from '../api-client';
import { endSession, signOutMutationKey } from './session';

/** Router state on the sign-in page right after signing out, so it can say so. */
export const SIGNED_OUT_STATE = { signedOut: true } as const;

export function isSignedOutState(state: unknown): boolean {
  return typeof state === 'object' && state !== null && 'signedOut' in state;
}

/** POST /api/auth/sign-out → 204. */
export function signOut(): Promise<void> {
  return api.post<void>('/auth/sign-out');
}

/**
 * Signing out only forgets the account; the signed-in guard then does the one redirect. (Also
 * navigating from here raced the guard's own redirect and lost.)
 */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: signOutMutationKey,
    mutationFn: signOut,
    onSuccess: () => endSession(queryClient),
    onError: (error) => {
      // A 401 means the session was already gone: the baker is signed out either way.
      if (isApiError(error) && error.status === 401) endSession(queryClient);
    },
  });
}

/** Whether the account went away because this person signed out (not an expired session). */
export function useSignedOutOnPurpose(): boolean {
  const statuses = useMutationState({
    filters: { mutationKey: signOutMutationKey },
    select: (mutation) => mutation.state.status,
  });
  const last = statuses.at(-1);
  return last === 'pending' || last === 'success';
}
