import { useTranslation } from 'react-i18next';
import { RouterButton } from '../../../components/links/router-link.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { paths } from '../../../config/paths.js';

/** An unknown slug: say so plainly and offer the way back to the whole catalogue. */
export function SpeciesNotFound({ slug }: { slug: string }) {
  const { t } = useTranslation('detail');
  return (
    <>
      <PageIntro title={t('page.notFound')}>{t('page.notFoundText', { slug })}</PageIntro>
      <ContentCard>
        <RouterButton to={paths.species.build()} appearance="primary">
          {t('page.searchAll')}
        </RouterButton>
      </ContentCard>
    </>
  );
}
