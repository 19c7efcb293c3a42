import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { ForgotPasswordForm } from '@/features/password-reset/components/forgot-password-form';

export function ForgotPasswordRoute() {
  return (
    <AuthLayout
      title="Forgot your password?"
      subtitle="Enter the e-mail you signed up with and we will send a link to choose a new one."
      footer={
        <>
          Remembered it?{' '}
          <Link component={RouterLink} to="/sign-in">
            Sign in
          </Link>
        </>
      }
    >
      <title>Forgot password · Peakwise</title>
      <ForgotPasswordForm />
    </AuthLayout>
  );
}
