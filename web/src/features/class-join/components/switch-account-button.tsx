import Button from '@mui/material/Button';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { endSession } from '@/lib/auth/session';
import { signOut } from '@/lib/auth/sign-out';

/**
 * Signs out without the "signed out on purpose" mark, so the guard sends the baker to sign in
 * with this page as `next`: signing in with the invited address lands back on the invitation.
 */
export function SwitchAccountButton() {
  const queryClient = useQueryClient();
  const mutation = useMutation({ mutationFn: signOut, onSettled: () => endSession(queryClient) });
  return (
    <Button variant="contained" loading={mutation.isPending} onClick={() => mutation.mutate()}>
      Sign out and use the invited address
    </Button>
  );
}
