import type { DeleteAccountRequest } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { PasswordField } from '@/components/form/password-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useDeleteAccount } from '../api/delete-account';

/**
 * Leaving for good. Two steps (open, then the password) so no single tap can do it; the words say
 * what goes and point to the export first.
 */
export function DeleteAccountCard({ email, teaches }: { email: string; teaches: boolean }) {
  const remove = useDeleteAccount();
  const [open, setOpen] = useState(false);
  const { control, handleSubmit, setError, formState } = useForm<DeleteAccountRequest>({
    defaultValues: { password: '' },
  });
  const onSubmit = handleSubmit(async (values) => {
    try {
      await remove.mutateAsync(values);
    } catch (error) {
      applyServerErrors(error, setError, ['password']);
    }
  });

  return (
    <Card component="section" aria-labelledby="delete-account-heading">
      <CardContent sx={{ display: 'grid', gap: 2 }}>
        <Typography id="delete-account-heading" variant="h2">
          Delete account
        </Typography>
        <Typography color="text.secondary">
          Deletes your cultures, feedings, rise checks, temperatures, formulas, bakes, photos and alerts, now and for
          good. Download your logbook above first if you may want it.
          {teaches && ' Any classes you teach are deleted too; your students keep their own logs.'}
        </Typography>
        {!open ? (
          <Button color="error" variant="outlined" onClick={() => setOpen(true)} sx={{ justifySelf: 'start' }}>
            Delete my account…
          </Button>
        ) : (
          <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2}>
            <Alert severity="warning">This cannot be undone. Enter your password to delete {email}.</Alert>
            <input type="text" name="username" autoComplete="username" value={email} readOnly hidden />
            <PasswordField
              control={control}
              name="password"
              label="Password"
              autoComplete="current-password"
              rules={{ required: 'Enter your password.' }}
            />
            <FormAlert message={formState.errors.root?.server?.message} />
            <Stack direction="row" spacing={1}>
              <Button type="submit" color="error" variant="contained" loading={formState.isSubmitting}>
                Delete everything
              </Button>
              <Button onClick={() => setOpen(false)}>Keep my account</Button>
            </Stack>
          </Stack>
        )}
      </CardContent>
    </Card>
  );
}
