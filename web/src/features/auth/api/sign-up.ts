import type { Account, SignUpRequest } from '@peakwise/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { startSession } from '@/lib/auth/session';

/** POST /api/auth/sign-up → 201 Account, already signed in; 409 when the e-mail is taken. */
export function signUp(body: SignUpRequest): Promise<Account> {
  return api.post<Account>('/auth/sign-up', body);
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (account) => startSession(queryClient, account),
  });
}
