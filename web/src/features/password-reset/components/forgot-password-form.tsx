import type { PasswordResetRequest } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { EmailField } from '@/components/form/email-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

const FIELDS = ['email'] as const;

/**
 * Asks for a reset link. The answer never says whether the address has an account (the server
 * answers the same either way), so the confirmation is worded as an "if".
 */
export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const { control, handleSubmit, setError, formState, getValues } = useForm<PasswordResetRequest>({
    defaultValues: { email: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await request.mutateAsync({ email: values.email.trim() });
    } catch (error) {
      applyServerErrors(error, setError, FIELDS);
    }
  });

  if (request.data) {
    const hours = request.data.expiresInMinutes / 60;
    const lifetime = hours === 1 ? 'an hour' : `${request.data.expiresInMinutes} minutes`;
    return (
      <Stack spacing={2}>
        <Alert severity="success" role="status">
          If {getValues('email').trim()} has a Peakwise account, we sent it a link to choose a new password. The link
          works for {lifetime}, and only once.
        </Alert>
        <Alert severity="info">No mail after a few minutes? Look in the spam folder, or ask again.</Alert>
        <Button variant="outlined" onClick={() => request.reset()}>
          Ask again
        </Button>
      </Stack>
    );
  }

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <EmailField control={control} name="email" />
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting}>
        Send me a link
      </Button>
    </Stack>
  );
}
