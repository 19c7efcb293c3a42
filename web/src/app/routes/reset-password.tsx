import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { ResetPasswordForm } from '@/features/password-reset/components/reset-password-form';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  return (
    <AuthLayout
      title="Choose a new password"
      subtitle="You will sign in with it from now on, on every device."
      footer={
        <>
          Link expired?{' '}
          <Link component={RouterLink} to="/forgot-password">
            Ask for a new one
          </Link>
        </>
      }
    >
      <title>Choose a new password · Peakwise</title>
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <Alert severity="warning">
          This page needs the link from your e-mail. Open the link again, or ask for a new one below.
        </Alert>
      )}
    </AuthLayout>
  );
}
