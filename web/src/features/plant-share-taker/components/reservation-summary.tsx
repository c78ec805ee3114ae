import { makeStyles, tokens } from '@fluentui/react-components';
import type { TakerReservation } from '@homeground/shared';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useLocale } from '../../../lib/i18n/index.js';
import { shareDateWords, slotWords } from '../utils/share-facts.js';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  facts: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr',
    columnGap: tokens.spacingHorizontalXL,
    rowGap: tokens.spacingVerticalS,
    margin: 0,
    '@media (max-width: 480px)': { gridTemplateColumns: '1fr' },
  },
  term: { fontWeight: tokens.fontWeightSemibold },
  value: { margin: 0 },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalXS },
  count: { fontVariantNumeric: 'tabular-nums', fontWeight: tokens.fontWeightSemibold },
  care: { display: 'grid', gap: tokens.spacingVerticalM },
  careName: { margin: `0 0 ${tokens.spacingVerticalS}` },
  scientific: { fontStyle: 'italic', fontWeight: tokens.fontWeightRegular, color: tokens.colorNeutralForeground3 },
});

/** Pickup (when, where, how, what to bring), the plants, and a care sheet for each species. */
export function ReservationSummary({ reservation }: { reservation: TakerReservation }) {
  const { t } = useTranslation('taker');
  const { locale } = useLocale();
  const styles = useStyles();
  const { share, slot } = reservation;
  return (
    <div className={styles.stack}>
      <ContentCard aria-labelledby="pickup-heading">
        <Heading level="section" id="pickup-heading">
          {t('pickupHeading')}
        </Heading>
        <dl className={styles.facts}>
          <dt className={styles.term}>{t('whenWords')}</dt>
          <dd className={styles.value}>
            {t('whenLine', { date: shareDateWords(share.date, locale), slot: slotWords(slot, locale) })}
          </dd>
          <dt className={styles.term}>{t('whereWords')}</dt>
          <dd className={styles.value}>
            {share.place.name}, {share.place.address}
          </dd>
          {share.place.directions ? (
            <>
              <dt className={styles.term}>{t('howWords')}</dt>
              <dd className={styles.value}>{share.place.directions}</dd>
            </>
          ) : null}
          <dt className={styles.term}>{t('bringWords')}</dt>
          <dd className={styles.value}>{share.whatToBring ?? t('bringAdvice')}</dd>
        </dl>
      </ContentCard>
      <ContentCard aria-labelledby="plants-heading">
        <Heading level="section" id="plants-heading">
          {t('plantsHeading')}
        </Heading>
        <ul className={styles.list}>
          {reservation.lines.map((l) => (
            <li key={l.speciesSlug}>
              <span className={styles.count}>{l.count}</span> × {l.commonName}
            </li>
          ))}
        </ul>
      </ContentCard>
      <ContentCard aria-labelledby="care-heading">
        <Heading level="section" id="care-heading">
          {t('careHeading')}
        </Heading>
        <div className={styles.care}>
          {reservation.careSheet.map((c) => (
            <section key={c.speciesSlug} aria-label={t('careFor', { name: c.commonName })}>
              <Heading level="card" className={styles.careName}>
                {c.commonName} <span className={styles.scientific}>{c.scientificName}</span>
              </Heading>
              <dl className={styles.facts}>
                <dt className={styles.term}>{t('careSun')}</dt>
                <dd className={styles.value}>{c.sun}</dd>
                <dt className={styles.term}>{t('careSoil')}</dt>
                <dd className={styles.value}>{c.moisture}</dd>
                <dt className={styles.term}>{t('careSpacing')}</dt>
                <dd className={styles.value}>{c.spacing}</dd>
              </dl>
              {c.cautions.length > 0 ? (
                <ul className={styles.list} aria-label={t('cautionsFor', { name: c.commonName })}>
                  {c.cautions.map((line) => (
                    <li key={line}>
                      <strong>{t('cautionLabel')}</strong> {line}
                    </li>
                  ))}
                </ul>
              ) : null}
            </section>
          ))}
        </div>
      </ContentCard>
    </div>
  );
}
