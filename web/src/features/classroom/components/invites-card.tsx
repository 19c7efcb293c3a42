import { CLASS_INVITE_TTL_DAYS, type Account, type ClassInvite, type ClassInviteStatus } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { FormTextField } from '@/components/form/form-text-field';
import { LoadError } from '@/components/feedback/load-error';
import { isApiError } from '@/lib/api-client';
import { useIdempotencyKey } from '@/lib/idempotency';
import { useCreateInvites } from '../api/create-invites';
import { useInvites } from '../api/get-invites';
import { useRevokeInvite } from '../api/revoke-invite';
import { parseEmails, validateEmails } from '../utils/invite-emails';
import { ConfirmDialog } from './confirm-dialog';

const STATUS: Record<ClassInviteStatus, { label: string; color: 'default' | 'primary' | 'success' | 'warning' }> = {
  pending: { label: 'Sent', color: 'primary' },
  accepted: { label: 'Joined', color: 'success' },
  expired: { label: 'Expired', color: 'warning' },
  revoked: { label: 'Revoked', color: 'default' },
};

const day = (iso: string, timeZone: string) =>
  new Date(iso).toLocaleDateString('en-GB', { timeZone, day: 'numeric', month: 'short' });

/** Invite by e-mail (several addresses at once), and the invitations sent so far with their status. */
export function InvitesCard({ classId, account }: { classId: string; account: Account }) {
  const invites = useInvites(classId, { limit: 100 });
  const create = useCreateInvites(classId);
  const revoke = useRevokeInvite(classId);
  const idempotency = useIdempotencyKey();
  const [revoking, setRevoking] = useState<ClassInvite | null>(null);
  const [sent, setSent] = useState<number | null>(null);
  const { control, handleSubmit, setError, formState, reset } = useForm<{ emails: string }>({
    defaultValues: { emails: '' },
  });

  const onSubmit = handleSubmit(async ({ emails }) => {
    setSent(null);
    try {
      const answer = await create.mutateAsync({
        body: { emails: parseEmails(emails).emails },
        headers: idempotency.headers(),
      });
      idempotency.settle();
      reset();
      setSent(answer.invites.length);
    } catch (error) {
      idempotency.settle(error);
      // The API names `emails` or one address in it (`emails.2`): both belong to the one box.
      const detail = isApiError(error) ? error.body.details?.find((d) => /^emails\b/.test(d.field)) : undefined;
      if (detail) setError('emails', { type: 'server', message: detail.message }, { shouldFocus: true });
      else setError('root.server', { type: 'server', message: isApiError(error) ? error.message : 'Not sent.' });
    }
  });

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Invite by e-mail
        </Typography>
        <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2}>
          <FormTextField
            control={control}
            name="emails"
            label="E-mail addresses"
            placeholder={'theo@example.com\namara@example.com'}
            multiline
            minRows={3}
            helperText={`One per line, or separated by commas. Each gets its own link, good once, for ${CLASS_INVITE_TTL_DAYS} days.`}
            rules={{ validate: validateEmails }}
          />
          <FormAlert message={formState.errors.root?.server?.message} />
          {sent !== null && (
            <Typography role="status" color="success.main">
              {sent === 1 ? 'Invitation sent.' : `${sent} invitations sent.`}
            </Typography>
          )}
          <Button type="submit" variant="contained" loading={formState.isSubmitting} sx={{ alignSelf: 'flex-start' }}>
            Send invitations
          </Button>
        </Stack>
        {invites.isError && <LoadError error={invites.error} onRetry={() => void invites.refetch()} />}
        {invites.data && invites.data.items.length > 0 && (
          <List aria-label="Invitations" sx={{ mt: 2 }}>
            {invites.data.items.map((invite) => {
              const status = STATUS[invite.status];
              const when =
                invite.status === 'accepted' && invite.acceptedAt
                  ? `joined ${day(invite.acceptedAt, account.timeZone)}`
                  : invite.status === 'pending'
                    ? `sent ${day(invite.createdAt, account.timeZone)}, good until ${day(invite.expiresAt, account.timeZone)}`
                    : `sent ${day(invite.createdAt, account.timeZone)}`;
              return (
                <ListItem
                  key={invite.id}
                  divider
                  disableGutters
                  secondaryAction={
                    invite.status === 'pending' ? (
                      <Button size="small" color="error" onClick={() => setRevoking(invite)}>
                        Revoke
                      </Button>
                    ) : undefined
                  }
                >
                  <ListItemText
                    primary={invite.email}
                    secondary={
                      <>
                        <Chip component="span" size="small" label={status.label} color={status.color} sx={{ mr: 1 }} />
                        {when}
                      </>
                    }
                    slotProps={{ primary: { sx: { overflowWrap: 'anywhere', pr: 8 } } }}
                  />
                </ListItem>
              );
            })}
          </List>
        )}
      </CardContent>
      <ConfirmDialog
        open={revoking !== null}
        title="Revoke the invitation?"
        confirmLabel="Revoke"
        pending={revoke.isPending}
        error={revoke.error}
        onClose={() => {
          revoke.reset();
          setRevoking(null);
        }}
        onConfirm={() => revoking && revoke.mutate(revoking.id, { onSuccess: () => setRevoking(null) })}
      >
        <Typography>
          The link sent to {revoking?.email} stops working. You can invite the address again later.
        </Typography>
      </ConfirmDialog>
    </Card>
  );
}
