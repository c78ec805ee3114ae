import { useTranslation } from 'react-i18next';
import { PageIntro } from '../components/page/page-intro.js';
import { EmptyState } from '../components/states/index.js';
import { SpeciesImportPanel } from '../features/species-import/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/** Curators import species from a CSV file, previewed before anything is written. */
export function SpeciesImportRoute() {
  const { t } = useTranslation('importer');
  useDocumentTitle(t('page.title'));
  return (
    <SignedInGate loading={t('page.loading')}>
      {(user) => (
        <>
          <PageIntro title={t('page.title')}>{t('page.intro')}</PageIntro>
          {user.role === 'curator' || user.role === 'admin' ? (
            <SpeciesImportPanel />
          ) : (
            <EmptyState title={t('page.notCurator')} />
          )}
        </>
      )}
    </SignedInGate>
  );
}
