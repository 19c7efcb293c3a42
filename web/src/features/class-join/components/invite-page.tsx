import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink } from 'react-router-dom';
import { FormAlert } from '@/components/form/form-alert';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { isApiError } from '@/lib/api-client';
import { useSignedInAccount } from '@/lib/auth/use-signed-in-account';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useAcceptInvite } from '../api/accept-invite';
import { useInvitePreview } from '../api/get-invite-preview';
import { inviteProblem } from '../utils/join-words';
import { JoinedNotice } from './joined-notice';
import { JoinPreview } from './join-preview';
import { SwitchAccountButton } from './switch-account-button';

/** The e-mailed invitation: the class, what joining shares, then "Join class" (or why it can't). */
export function InvitePage({ token }: { token: string }) {
  const account = useSignedInAccount();
  const preview = useInvitePreview(token);
  const accept = useAcceptInvite(token);
  const key = useIdempotencyKey();

  if (preview.isPending) return <PageLoader />;
  if (preview.isError) {
    const problem = inviteProblem(preview.error, account.email);
    return (
      <Page title="Class invitation">
        <Alert severity={problem.kind === 'failed' ? 'error' : 'warning'} role="alert">
          <AlertTitle>{problem.title}</AlertTitle>
          {problem.message}
          {problem.signedInAs && (
            <>
              {' '}
              You are signed in as{' '}
              <strong style={{ display: 'inline-block', overflowWrap: 'anywhere' }}>{problem.signedInAs}</strong>.
            </>
          )}
        </Alert>
        <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
          {problem.kind === 'other-account' && <SwitchAccountButton />}
          {problem.kind === 'failed' && (
            <Button variant="contained" onClick={() => void preview.refetch()}>
              Try again
            </Button>
          )}
          {problem.kind !== 'other-account' && (
            <Button component={RouterLink} to="/classes/join" variant="outlined">
              Join with a code instead
            </Button>
          )}
        </Stack>
      </Page>
    );
  }

  const p = preview.data;
  const join = async () => {
    try {
      await accept.mutateAsync(key.headers());
      key.settle();
    } catch (e) {
      key.settle(e);
    }
  };
  // A refusal on accept (e.g. the instructor revoked the link meanwhile) reads like one on load.
  const acceptProblem = accept.error ? inviteProblem(accept.error, account.email) : null;

  return (
    <Page title="Class invitation" intro={`${p.instructorName} invited you to join a class on Peakwise.`}>
      <JoinPreview
        preview={p}
        actions={
          accept.isSuccess || p.alreadyMember ? (
            <JoinedNotice name={p.name} instructorName={p.instructorName} already={!accept.isSuccess} />
          ) : (
            <Stack spacing={1.5}>
              <FormAlert
                message={
                  acceptProblem
                    ? isApiError(accept.error) && accept.error.status === 0
                      ? accept.error.message
                      : `${acceptProblem.title}. ${acceptProblem.message}${acceptProblem.signedInAs ? ` You are signed in as ${acceptProblem.signedInAs}.` : ''}`
                    : undefined
                }
              />
              {acceptProblem?.kind === 'other-account' && <SwitchAccountButton />}
              <Button
                variant="contained"
                size="large"
                loading={accept.isPending}
                onClick={() => void join()}
                sx={{ alignSelf: { sm: 'flex-start' } }}
              >
                Join class
              </Button>
              <Button component={RouterLink} to="/" sx={{ alignSelf: { sm: 'flex-start' } }}>
                Not now
              </Button>
            </Stack>
          )
        }
      />
    </Page>
  );
}
