import type { SeasonSeedList } from '../../../api/seasons/seasons.api.js';
import { useTranslation } from 'react-i18next';
import { Heading } from '../../../components/page/page-heading.js';
import { useSeasonStyles } from './season.styles.js';

/**
 * What to know before buying or collecting: species worth collecting locally (or never from the
 * wild) with their notes, each species' handling cautions, and the usual collecting cautions.
 */
export function SeedListNotes({ list }: { list: SeasonSeedList }) {
  const { t } = useTranslation('season');
  const styles = useSeasonStyles();
  const collect = list.rows.filter((r) => r.collectLocally || r.neverCollectWild || r.collectNotes.length > 0);
  const careful = list.rows.filter((r) => r.cautions.length > 0);
  return (
    <>
      {collect.length > 0 ? (
        <section aria-labelledby="seed-list-collect">
          <Heading level="card" id="seed-list-collect">
            {t('seedList.collectHeading')}
          </Heading>
          <ul className={styles.list}>
            {collect.map((r) => (
              <li key={r.slug}>
                {t(r.neverCollectWild ? 'seedList.collectNeverWild' : 'seedList.collectLine', {
                  name: r.commonName,
                  notes: r.collectNotes.join(' '),
                })}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      {careful.length > 0 ? (
        <section aria-labelledby="seed-list-handling">
          <Heading level="card" id="seed-list-handling">
            {t('seedList.handleHeading')}
          </Heading>
          <ul className={styles.list}>
            {careful.map((r) => (
              <li key={r.slug}>
                <strong>{r.commonName}</strong>: {r.cautions.map((c) => c.text).join(' ')}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <section aria-labelledby="seed-list-cautions">
        <Heading level="card" id="seed-list-cautions">
          {t('seedList.cautionsHeading')}
        </Heading>
        <ul className={styles.list}>
          {list.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>
    </>
  );
}
