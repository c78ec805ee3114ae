import { useTranslation } from 'react-i18next';
import { SpeciesImportPanel } from '../features/species-import/index.js';
import { CuratorPage } from './curator-page.js';

/** Curators import species from a CSV file, previewed before anything is written. */
export function SpeciesImportRoute() {
  const { t } = useTranslation('importer');
  const words = {
    title: t('page.title'),
    intro: t('page.intro'),
    loading: t('page.loading'),
    notCurator: t('page.notCurator'),
  };
  return (
    <CuratorPage words={words}>
      <SpeciesImportPanel />
    </CuratorPage>
  );
}
