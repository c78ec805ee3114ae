import type { Season } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useFormatters, useWords } from '../../../lib/i18n/index.js';
import { SeasonDatesForm } from './season-dates-form.js';
import { useSeasonStyles } from './season.styles.js';

/** When the season runs and how the group grows: the facts every date and count hangs on. */
export function SeasonDates({ season, slug, canEdit }: { season: Season; slug: string; canEdit: boolean }) {
  const styles = useSeasonStyles();
  const { t } = useTranslation('season');
  const words = useWords();
  const fmt = useFormatters();
  const long = (day: string) => fmt.date(day, { weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' });
  return (
    <ContentCard aria-labelledby="season-dates">
      <Heading level="section" id="season-dates">
        {t('dates.title')}
      </Heading>
      <dl className={styles.facts}>
        <dt className={styles.term}>{t('dates.lastFrost')}</dt>
        <dd className={styles.value}>{long(season.lastFrost)}</dd>
        <dt className={styles.term}>{t('dates.plantShare')}</dt>
        <dd className={styles.value}>{long(season.plantShareDate)}</dd>
        <dt className={styles.term}>{t('dates.methods')}</dt>
        <dd className={styles.value}>{words.sowingMethodsPhrase(season.methods, 'and')}</dd>
        <dt className={styles.term}>{t('dates.milkweeds')}</dt>
        <dd className={styles.value}>{t('dates.milkweedShare', { share: season.milkweedShare })}</dd>
        <dt className={styles.term}>{t('dates.losses')}</dt>
        <dd className={styles.value}>{fmt.number(season.lossFactor, { style: 'percent' })}</dd>
        <dt className={styles.term}>{t('dates.seedsPerPacket')}</dt>
        <dd className={styles.value}>{fmt.number(season.seedsPerPacket)}</dd>
      </dl>
      {canEdit ? <SeasonDatesForm slug={slug} season={season} /> : null}
    </ContentCard>
  );
}
