import { Navigate, useLocation } from 'react-router-dom';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState, LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { AccountDetails } from '../features/account/index.js';
import { useSession } from '../features/auth/index.js';
import { SavedMixesList } from '../features/yard-mix/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function AccountRoute() {
  const session = useSession();
  const { pathname } = useLocation();
  useDocumentTitle('Your account');

  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading') return <LoadingState label="Loading your account" />;

  return (
    <>
      <PageIntro title="Your account" />
      {session.user ? (
        <>
          <AccountDetails user={session.user} />
          <SavedMixesList />
        </>
      ) : (
        <ErrorState
          title="Your account details did not load."
          message={session.profileError?.message}
          onRetry={session.retryProfile}
        />
      )}
    </>
  );
}
