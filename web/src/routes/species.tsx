import { useTranslation } from 'react-i18next';
import type { QueryClient } from '@tanstack/react-query';
import { RouterButton, RouterLink } from '../components/links/router-link.js';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { SpeciesBrowser, speciesBrowserLoader } from '../features/species-browser/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function speciesLoader(queryClient: QueryClient) {
  return speciesBrowserLoader(queryClient);
}

export function SpeciesRoute() {
  const { t } = useTranslation('species');
  const { t: te } = useTranslation('editor');
  const { t: tr } = useTranslation('reference');
  const { t: ti } = useTranslation('importer');
  const role = useSession().user?.role;
  useDocumentTitle(t('page.title'));
  return (
    <>
      <PageIntro title={t('page.title')}>{t('page.intro')}</PageIntro>
      {role === 'curator' || role === 'admin' ? (
        <p>
          <RouterButton to={paths.speciesNew.build()} appearance="secondary">
            {te('page.add')}
          </RouterButton>{' '}
          <RouterLink to={paths.speciesImport.build()}>{ti('page.open')}</RouterLink>{' '}
          <RouterLink to={paths.referenceChecks.build()}>{tr('page.open')}</RouterLink>
        </p>
      ) : null}
      <SpeciesBrowser />
    </>
  );
}
