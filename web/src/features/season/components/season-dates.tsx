import { type Season, sowingMethodsPhrase } from '@homeground/shared';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { longDate, percentWords } from '../utils/season-words.js';
import { SeasonDatesForm } from './season-dates-form.js';
import { useSeasonStyles } from './season.styles.js';

/** When the season runs and how the group grows: the facts every date and count hangs on. */
export function SeasonDates({ season, slug, canEdit }: { season: Season; slug: string; canEdit: boolean }) {
  const styles = useSeasonStyles();
  return (
    <ContentCard aria-labelledby="season-dates">
      <Heading level="section" id="season-dates">
        Dates and methods
      </Heading>
      <dl className={styles.facts}>
        <dt className={styles.term}>Average last spring frost</dt>
        <dd className={styles.value}>{longDate(season.lastFrost)}</dd>
        <dt className={styles.term}>Plant share</dt>
        <dd className={styles.value}>{longDate(season.plantShareDate)}</dd>
        <dt className={styles.term}>How the growers sow</dt>
        <dd className={styles.value}>{sowingMethodsPhrase(season.methods, 'and')}</dd>
        <dt className={styles.term}>Milkweeds for monarchs</dt>
        <dd className={styles.value}>{percentWords(season.milkweedShare)} of the plants</dd>
        <dt className={styles.term}>Seedlings allowed for losses</dt>
        <dd className={styles.value}>{percentWords(season.lossFactor)}</dd>
        <dt className={styles.term}>Seeds in a packet</dt>
        <dd className={styles.value}>{season.seedsPerPacket}</dd>
      </dl>
      {canEdit ? <SeasonDatesForm slug={slug} season={season} /> : null}
    </ContentCard>
  );
}
