import type { Account, SignInRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { startSession } from '@/lib/auth/session';

/** POST /api/auth/sign-in → 200 Account (session cookie set); 401 when the pair doesn't match. */
export function signIn(body: SignInRequest): Promise<Account> {
  return api.post<Account>('/auth/sign-in', body);
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (account) => startSession(queryClient, account),
  });
}
