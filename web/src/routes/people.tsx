import { PageIntro } from '../components/page/page-intro.js';
import { EmptyState } from '../components/states/index.js';
import { PeoplePage } from '../features/people/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/** Admins only; anyone else is told whose page it is rather than shown an error. */
export function PeopleRoute() {
  useDocumentTitle('People');
  return (
    <SignedInGate loading="Checking your sign-in">
      {(user) => (
        <>
          <PageIntro title="People">Accounts, roles and sign-in activity across Homeground.</PageIntro>
          {user.role === 'admin' ? (
            <PeoplePage myId={user.id} />
          ) : (
            <EmptyState title="This page is for Homeground admins." />
          )}
        </>
      )}
    </SignedInGate>
  );
}
