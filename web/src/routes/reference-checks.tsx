import { useTranslation } from 'react-i18next';
import { UnexplainedList } from '../features/species-reference/index.js';
import { CuratorPage } from './curator-page.js';

/** Curators work through the catalogue's unexplained differences from the reference data. */
export function ReferenceChecksRoute() {
  const { t } = useTranslation('reference');
  const words = {
    title: t('page.title'),
    intro: t('page.intro'),
    loading: t('page.loading'),
    notCurator: t('page.notCurator'),
  };
  return (
    <CuratorPage words={words}>
      <UnexplainedList />
    </CuratorPage>
  );
}
