import type { User } from '@homeground/shared';
import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { ErrorState, LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';

/**
 * The door of every signed-in page: a signed-out visitor goes to sign in (and comes back here after),
 * the page waits while the session loads, says so when the profile did not load, and otherwise renders
 * `children` with the signed-in person.
 */
export function SignedInGate({ loading, children }: { loading: string; children: (user: User) => ReactNode }) {
  const session = useSession();
  const { pathname } = useLocation();
  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading') return <LoadingState label={loading} />;
  if (!session.user) {
    return (
      <ErrorState
        title="Your account details did not load."
        message={session.profileError?.message}
        onRetry={session.retryProfile}
      />
    );
  }
  return <>{children(session.user)}</>;
}
