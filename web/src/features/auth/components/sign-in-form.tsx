import type { SignInRequest } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { Link as RouterLink } from 'react-router-dom';
import { FormAlert } from '@/components/form/form-alert';
import { EmailField } from '@/components/form/email-field';
import { PasswordField } from '@/components/form/password-field';
import { applyServerErrors } from '@/lib/form-errors';
import { useSignIn } from '../api/sign-in';

const FIELDS = ['email', 'password'] as const;

/** On success the current account is set and the route guard moves the baker on. */
export function SignInForm() {
  const signIn = useSignIn();
  const { control, handleSubmit, setError, formState } = useForm<SignInRequest>({
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await signIn.mutateAsync({ email: values.email.trim(), password: values.password });
    } catch (error) {
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <EmailField control={control} name="email" />
      <PasswordField
        control={control}
        name="password"
        label="Password"
        autoComplete="current-password"
        rules={{ required: 'Enter your password.' }}
      />
      <Link component={RouterLink} to="/forgot-password" variant="body2" sx={{ alignSelf: 'flex-end', py: 1 }}>
        Forgot password?
      </Link>
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting}>
        Sign in
      </Button>
    </Stack>
  );
}
