import { makeStyles, tokens } from '@fluentui/react-components';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { shareDateWords, slotWords } from '../utils/share-facts.js';
import { TAKER_WORDS as W } from '../utils/taker-words.js';

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
  careName: { margin: 0 },
});

/** What a reservation holds, as the confirmation, the e-mail and the private page all say it. */
export interface ReservationView {
  date: string;
  place: string;
  whatToBring: string;
  slot: { start: string; end: string };
  items: readonly { slug: string; commonName: string; count: number; careSheet: readonly string[] }[];
}

/** Pickup (when, where, what to bring), the plants, and a care sheet for each species. */
export function ReservationSummary({ reservation }: { reservation: ReservationView }) {
  const styles = useStyles();
  return (
    <div className={styles.stack}>
      <ContentCard aria-labelledby="pickup-heading">
        <Heading level="section" id="pickup-heading">
          {W.pickupHeading}
        </Heading>
        <dl className={styles.facts}>
          <dt className={styles.term}>{W.whenWords}</dt>
          <dd className={styles.value}>
            {shareDateWords(reservation.date)}, {slotWords(reservation.slot)}
          </dd>
          <dt className={styles.term}>{W.whereWords}</dt>
          <dd className={styles.value}>{reservation.place}</dd>
          <dt className={styles.term}>{W.bringWords}</dt>
          <dd className={styles.value}>{reservation.whatToBring}</dd>
        </dl>
      </ContentCard>
      <ContentCard aria-labelledby="plants-heading">
        <Heading level="section" id="plants-heading">
          {W.plantsHeading}
        </Heading>
        <ul className={styles.list}>
          {reservation.items.map((i) => (
            <li key={i.slug}>
              <span className={styles.count}>{i.count}</span> × {i.commonName}
            </li>
          ))}
        </ul>
      </ContentCard>
      <ContentCard aria-labelledby="care-heading">
        <Heading level="section" id="care-heading">
          {W.careHeading}
        </Heading>
        <div className={styles.care}>
          {reservation.items.map((i) => (
            <section key={i.slug} aria-label={`${W.careHeading}: ${i.commonName}`}>
              <Heading level="card" className={styles.careName}>
                {i.commonName}
              </Heading>
              <ul className={styles.list}>
                {i.careSheet.map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            </section>
          ))}
        </div>
      </ContentCard>
    </div>
  );
}
