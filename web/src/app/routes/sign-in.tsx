import Alert from '@mui/material/Alert';
import Link from '@mui/material/Link';
import { Link as RouterLink, useLocation } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { isSignedOutState } from '@/lib/auth/sign-out';

export function SignInRoute() {
  const location = useLocation();
  return (
    <AuthLayout
      title="Sign in"
      subtitle="Welcome back to your fermentation logbook."
      footer={
        <>
          New to Peakwise? {/* Keep ?next= so signing up instead still lands where the baker was heading. */}
          <Link component={RouterLink} to={{ pathname: '/sign-up', search: location.search }}>
            Create an account
          </Link>
        </>
      }
    >
      <title>Sign in · Peakwise</title>
      {isSignedOutState(location.state) && (
        <Alert severity="info" role="status">
          You’re signed out. See you at the next feeding.
        </Alert>
      )}
      <SignInForm />
    </AuthLayout>
  );
}
