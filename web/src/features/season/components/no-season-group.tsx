import { useTranslation } from 'react-i18next';
import { ContentCard } from '../../../components/page/content-card.js';
import { PageIntro } from '../../../components/page/page-intro.js';

/** Someone in no growing group: say plainly what the page is for and how to get a season plan. */
export function NoSeasonGroup() {
  const { t } = useTranslation('season');
  return (
    <>
      <PageIntro title={t('page.title')} />
      <ContentCard aria-label={t('noGroup.label')}>
        <p>{t('noGroup.text')}</p>
      </ContentCard>
    </>
  );
}
