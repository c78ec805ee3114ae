import { useTranslation } from 'react-i18next';
import { RouterButton } from '../components/links/router-link.js';
import { ContentCard } from '../components/page/content-card.js';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function NotFoundRoute() {
  const { t } = useTranslation();
  useDocumentTitle(t('notFound.title'));
  return (
    <>
      <PageIntro title={t('notFound.title')}>{t('notFound.body')}</PageIntro>
      <ContentCard>
        <RouterButton to={paths.home.build()} appearance="primary">
          {t('notFound.home')}
        </RouterButton>
      </ContentCard>
    </>
  );
}
