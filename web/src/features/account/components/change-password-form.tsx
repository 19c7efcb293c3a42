import type { ChangePasswordRequest } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { PasswordField } from '@/components/form/password-field';
import { applyServerErrors } from '@/lib/form-errors';
import { newPasswordHint, newPasswordRules } from '@/lib/validation';
import { useChangePassword } from '../api/change-password';

// `repeatPassword` never leaves the browser: it only catches a typo in a field you can't see.
type PasswordValues = ChangePasswordRequest & { repeatPassword: string };
const FIELDS = ['currentPassword', 'newPassword'] as const;
const EMPTY: PasswordValues = { currentPassword: '', newPassword: '', repeatPassword: '' };

export function ChangePasswordForm({ email }: { email: string }) {
  const changePassword = useChangePassword();
  const [changed, setChanged] = useState(false);
  const { control, handleSubmit, setError, reset, formState } = useForm<PasswordValues>({
    defaultValues: EMPTY,
  });

  const onSubmit = handleSubmit(async ({ currentPassword, newPassword }) => {
    setChanged(false);
    try {
      await changePassword.mutateAsync({ currentPassword, newPassword });
      reset(EMPTY);
      setChanged(true);
    } catch (error) {
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      {/* Lets password managers file the new password under the right account. */}
      <input type="text" name="username" autoComplete="username" value={email} readOnly hidden />
      <PasswordField
        control={control}
        name="currentPassword"
        label="Current password"
        autoComplete="current-password"
        rules={{ required: 'Enter your current password.' }}
      />
      <PasswordField
        control={control}
        name="newPassword"
        label="New password"
        autoComplete="new-password"
        helperText={newPasswordHint}
        rules={newPasswordRules}
      />
      <PasswordField
        control={control}
        name="repeatPassword"
        label="Repeat new password"
        autoComplete="new-password"
        rules={{
          required: 'Type the new password again.',
          validate: (value, values) => value === values.newPassword || 'This doesn’t match the new password.',
        }}
      />
      <FormAlert message={formState.errors.root?.server?.message} />
      {changed && (
        <Alert severity="success" role="status">
          Password changed. Use the new one next time you sign in.
        </Alert>
      )}
      <Box>
        <Button type="submit" variant="contained" loading={formState.isSubmitting}>
          Change password
        </Button>
      </Box>
    </Stack>
  );
}
