import type { SignUpRequest } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { FormAlert } from '@/components/form/form-alert';
import { EmailField } from '@/components/form/email-field';
import { FormTextField } from '@/components/form/form-text-field';
import { PasswordField } from '@/components/form/password-field';
import { applyServerErrors } from '@/lib/form-errors';
import { displayNameRules, newPasswordHint, newPasswordRules } from '@/lib/validation';
import { useSignUp } from '../api/sign-up';

const FIELDS = ['displayName', 'email', 'password'] as const;

/** Sign-up also signs in; the route guard then takes the new baker home. */
export function SignUpForm() {
  const signUp = useSignUp();
  const { control, handleSubmit, setError, formState } = useForm<SignUpRequest>({
    defaultValues: { displayName: '', email: '', password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await signUp.mutateAsync({
        displayName: values.displayName.trim(),
        email: values.email.trim(),
        password: values.password,
        // Start the account in the kitchen's own time; the Account page can change it.
        timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone,
      });
    } catch (error) {
      applyServerErrors(error, setError, FIELDS);
    }
  });

  return (
    <Stack component="form" noValidate onSubmit={(e) => void onSubmit(e)} spacing={2.5}>
      <FormTextField
        control={control}
        name="displayName"
        label="Your name"
        autoComplete="name"
        helperText="Shown to you, and to your instructor if you join a class."
        rules={displayNameRules}
      />
      <EmailField control={control} name="email" />
      <PasswordField
        control={control}
        name="password"
        label="Password"
        autoComplete="new-password"
        helperText={newPasswordHint}
        rules={newPasswordRules}
      />
      <FormAlert message={formState.errors.root?.server?.message} />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting}>
        Create account
      </Button>
    </Stack>
  );
}
