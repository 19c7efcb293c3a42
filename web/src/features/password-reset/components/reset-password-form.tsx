import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { Link as RouterLink } from 'react-router-dom';
import { FormAlert } from '@/components/form/form-alert';
import { PasswordField } from '@/components/form/password-field';
import { applyServerErrors } from '@/lib/form-errors';
import { newPasswordHint, newPasswordRules } from '@/lib/validation';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

interface ResetPasswordValues {
  password: string;
}

const FIELDS = ['password'] as const;

/** Sets a new password with the token from the e-mailed link; then the baker signs in with it. */
export function ResetPasswordForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const { control, handleSubmit, setError, formState } = useForm<ResetPasswordValues>({
    defaultValues: { password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await confirm.mutateAsync({ token, password: values.password });
    } catch (error) {
      // An expired or used link comes back naming `token`, which is no field here: it shows above the button.
      applyServerErrors(error, setError, FIELDS);
    }
  });

  if (confirm.isSuccess) {
    return (
      <Stack spacing={2}>
        <Alert severity="success" role="status">
          Your password is changed. Every device that was signed in has been signed out.
        </Alert>
        <Button component={RouterLink} to="/sign-in" variant="contained" size="large">
          Sign in
        </Button>
      </Stack>
    );
  }

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <PasswordField
        control={control}
        name="password"
        label="New password"
        autoComplete="new-password"
        helperText={newPasswordHint}
        rules={newPasswordRules}
      />
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting}>
        Set new password
      </Button>
    </Stack>
  );
}
