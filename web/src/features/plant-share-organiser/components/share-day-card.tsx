import type { PlantShare } from '@homeground/shared';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { RouterLink } from '../../../components/links/router-link.js';
import { ORGANISER_WORDS as W } from '../utils/organiser-words.js';
import { shareDateWords, slotWords } from '../utils/slot-time.js';
import { useOrganiserStyles } from './organiser.styles.js';

/** The day as set: date, place, limits and slots, with the public page's link to hand out. */
export function ShareDayCard({ share, publicHref }: { share: PlantShare; publicHref: string }) {
  const styles = useOrganiserStyles();
  return (
    <ContentCard aria-labelledby="share-day">
      <Heading level="section" id="share-day">
        {W.dayHeading}
      </Heading>
      <dl className={styles.facts}>
        <dt className={styles.term}>{W.date}</dt>
        <dd className={styles.value}>{shareDateWords(share.date)}</dd>
        <dt className={styles.term}>{W.placeName}</dt>
        <dd className={styles.value}>
          {share.place.name}, {share.place.address}
          {share.place.directions ? `. ${share.place.directions}` : ''}
        </dd>
        <dt className={styles.term}>{W.whatToBring}</dt>
        <dd className={styles.value}>{share.whatToBring ?? W.whatToBringNone}</dd>
        <dt className={styles.term}>{W.limitPerSpecies}</dt>
        <dd className={styles.value}>{share.limits.perSpecies}</dd>
        <dt className={styles.term}>{W.limitTotal}</dt>
        <dd className={styles.value}>{share.limits.total}</dd>
        <dt className={styles.term}>{W.slotsHeading}</dt>
        <dd className={styles.value}>
          <ul className={styles.list}>
            {share.slots.map((s) => (
              <li key={s.id}>
                {slotWords(s)}: {W.slotLine(s.booked, s.capacity)}
              </li>
            ))}
          </ul>
        </dd>
        <dt className={styles.term}>{W.publicLink}</dt>
        <dd className={styles.value}>
          <RouterLink to={publicHref}>{publicHref}</RouterLink>
        </dd>
      </dl>
      <p className={styles.lead}>{W.privacyLine(shareDateWords(share.personalDataKeptUntil))}</p>
    </ContentCard>
  );
}
