import { useTranslation } from 'react-i18next';
import { PageIntro } from '../components/page/page-intro.js';
import { EmptyState } from '../components/states/index.js';
import { UnexplainedList } from '../features/species-reference/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/** Curators work through the catalogue's unexplained differences from the reference data. */
export function ReferenceChecksRoute() {
  const { t } = useTranslation('reference');
  useDocumentTitle(t('page.title'));
  return (
    <SignedInGate loading={t('page.loading')}>
      {(user) => (
        <>
          <PageIntro title={t('page.title')}>{t('page.intro')}</PageIntro>
          {user.role === 'curator' || user.role === 'admin' ? (
            <UnexplainedList />
          ) : (
            <EmptyState title={t('page.notCurator')} />
          )}
        </>
      )}
    </SignedInGate>
  );
}
