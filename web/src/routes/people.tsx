import { Navigate, useLocation } from 'react-router-dom';
import { PageIntro } from '../components/page/page-intro.js';
import { EmptyState, LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { PeoplePage } from '../features/people/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** Admins only; anyone else is told whose page it is rather than shown an error. */
export function PeopleRoute() {
  const session = useSession();
  const { pathname } = useLocation();
  useDocumentTitle('People');

  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading' || !session.user) return <LoadingState label="Checking your sign-in" />;
  return (
    <>
      <PageIntro title="People">Accounts, roles and sign-in activity across Homeground.</PageIntro>
      {session.user.role === 'admin' ? (
        <PeoplePage myId={session.user.id} />
      ) : (
        <EmptyState title="This page is for Homeground admins." />
      )}
    </>
  );
}
