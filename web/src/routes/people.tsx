import { useTranslation } from 'react-i18next';
import { PageIntro } from '../components/page/page-intro.js';
import { EmptyState } from '../components/states/index.js';
import { PeoplePage } from '../features/people/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/** Admins only; anyone else is told whose page it is rather than shown an error. */
export function PeopleRoute() {
  const { t } = useTranslation('people');
  useDocumentTitle(t('page.title'));
  return (
    <SignedInGate loading={t('page.loading')}>
      {(user) => (
        <>
          <PageIntro title={t('page.title')}>{t('page.intro')}</PageIntro>
          {user.role === 'admin' ? <PeoplePage myId={user.id} /> : <EmptyState title={t('page.notAdmin')} />}
        </>
      )}
    </SignedInGate>
  );
}
