import Link from '@mui/material/Link';
import { Link as RouterLink, useLocation } from 'react-router-dom';
import { AuthLayout } from '@/components/layout/auth-layout';
import { SignUpForm } from '@/features/auth/components/sign-up-form';

export function SignUpRoute() {
  const location = useLocation();
  return (
    <AuthLayout
      title="Create your account"
      subtitle="Start a logbook that learns your starter and tells you when it will peak."
      footer={
        <>
          Already have an account?{' '}
          <Link component={RouterLink} to={{ pathname: '/sign-in', search: location.search }}>
            Sign in
          </Link>
        </>
      }
    >
      <title>Create your account · Peakwise</title>
      <SignUpForm />
    </AuthLayout>
  );
}
