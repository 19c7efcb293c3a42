import type { Role } from '@peakwise/shared';
import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation, useSearchParams } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { useCurrentAccount } from './current-account';
import { NEXT_PARAM, safeNextPath, signInPathFor } from './next-path';
import { SIGNED_OUT_STATE, useSignedOutOnPurpose } from './sign-out';

/**
 * <Navigate> renders nothing while the target page's code downloads, which on a slow phone
 * line is a blank screen; show the loader meanwhile.
 */
function Redirect({ to, state }: { to: string; state?: unknown }) {
  return (
    <>
      <Navigate to={to} state={state} replace />
      <PageLoader />
    </>
  );
}

/** Signed-in pages: a signed-out visitor is sent to sign in and brought back afterwards. */
export function RequireAuth() {
  const location = useLocation();
  const { data: account, isPending, error, refetch } = useCurrentAccount();
  const signedOutOnPurpose = useSignedOutOnPurpose();

  if (isPending) return <PageLoader />;
  if (error) return <LoadError error={error} onRetry={() => void refetch()} />;
  if (!account) {
    // After signing out, a fresh start; after an expired session, a way back to this page.
    return (
      <Redirect
        to={signedOutOnPurpose ? '/sign-in' : signInPathFor(location.pathname + location.search)}
        state={signedOutOnPurpose ? SIGNED_OUT_STATE : undefined}
      />
    );
  }
  return <Outlet />;
}

/** Sign-in and sign-up: someone already signed in goes on to where they were heading. */
export function RequireSignedOut() {
  const [searchParams] = useSearchParams();
  const { data: account, isPending } = useCurrentAccount();

  if (isPending) return <PageLoader />;
  // If the check itself failed we still show the form: signing in is the way to recover.
  if (account) {
    return <Redirect to={safeNextPath(searchParams.get(NEXT_PARAM))} />;
  }
  return <Outlet />;
}

interface RequireRoleProps {
  role: Role;
  /** What to show someone signed in without the role. */
  fallback: ReactNode;
}

/** A page for one role; must sit inside <RequireAuth>. The server checks the role again. */
export function RequireRole({ role, fallback }: RequireRoleProps) {
  const { data: account } = useCurrentAccount();
  return account?.role === role ? <Outlet /> : <>{fallback}</>;
}
