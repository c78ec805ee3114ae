import { useTranslation } from 'react-i18next';
import type { QueryClient } from '@tanstack/react-query';
import { PageIntro } from '../components/page/page-intro.js';
import { SpeciesBrowser, speciesBrowserLoader } from '../features/species-browser/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function speciesLoader(queryClient: QueryClient) {
  return speciesBrowserLoader(queryClient);
}

export function SpeciesRoute() {
  const { t } = useTranslation('species');
  useDocumentTitle(t('page.title'));
  return (
    <>
      <PageIntro title={t('page.title')}>{t('page.intro')}</PageIntro>
      <SpeciesBrowser />
    </>
  );
}
