import type { PlantShare } from '@homeground/shared';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { RouterLink } from '../../../components/links/router-link.js';
import { useTranslation } from 'react-i18next';
import { useLocale } from '../../../lib/i18n/index.js';
import { shareDateWords, slotWords } from '../utils/slot-time.js';
import { useOrganiserStyles } from './organiser.styles.js';

/** The day as set: date, place, limits and slots, with the public page's link to hand out. */
export function ShareDayCard({ share, publicHref }: { share: PlantShare; publicHref: string }) {
  const { t } = useTranslation('organiser');
  const { locale } = useLocale();
  const styles = useOrganiserStyles();
  return (
    <ContentCard aria-labelledby="share-day">
      <Heading level="section" id="share-day">
        {t('dayHeading')}
      </Heading>
      <dl className={styles.facts}>
        <dt className={styles.term}>{t('date')}</dt>
        <dd className={styles.value}>{shareDateWords(share.date, locale)}</dd>
        <dt className={styles.term}>{t('placeName')}</dt>
        <dd className={styles.value}>
          {share.place.name}, {share.place.address}
          {share.place.directions ? `. ${share.place.directions}` : ''}
        </dd>
        <dt className={styles.term}>{t('whatToBring')}</dt>
        <dd className={styles.value}>{share.whatToBring ?? t('whatToBringNone')}</dd>
        <dt className={styles.term}>{t('limitPerSpecies')}</dt>
        <dd className={styles.value}>{share.limits.perSpecies}</dd>
        <dt className={styles.term}>{t('limitTotal')}</dt>
        <dd className={styles.value}>{share.limits.total}</dd>
        <dt className={styles.term}>{t('slotsHeading')}</dt>
        <dd className={styles.value}>
          <ul className={styles.list}>
            {share.slots.map((s) => (
              <li key={s.id}>
                {slotWords(s, locale)}: {t('slotLine', { booked: s.booked, count: s.capacity })}
              </li>
            ))}
          </ul>
        </dd>
        <dt className={styles.term}>{t('publicLink')}</dt>
        <dd className={styles.value}>
          <RouterLink to={publicHref}>{publicHref}</RouterLink>
        </dd>
      </dl>
      <p className={styles.lead}>{t('privacyLine', { until: shareDateWords(share.personalDataKeptUntil, locale) })}</p>
    </ContentCard>
  );
}
