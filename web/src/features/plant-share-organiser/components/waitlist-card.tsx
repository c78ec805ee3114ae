import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { shareWaitlistQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { LOCALE_TAGS, type Locale, useLocale } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { useOrganiserStyles } from './organiser.styles.js';

const heldWords = (iso: string, locale: Locale) =>
  new Intl.DateTimeFormat(LOCALE_TAGS[locale], {
    weekday: 'short',
    month: 'short',
    day: 'numeric',
    hour: 'numeric',
    minute: '2-digit',
  }).format(new Date(iso));

/**
 * Who waits for which plants, per species, in the order new or freed plants are offered. Names and
 * e-mails are the group organisers' only (the API answers 403 to anyone else).
 */
export function WaitlistCard({ groupSlug }: { groupSlug: string }) {
  const { t } = useTranslation('organiser');
  const { locale } = useLocale();
  const styles = useOrganiserStyles();
  const waitlist = useQuery(shareWaitlistQueryOptions(groupSlug));
  return (
    <ContentCard aria-labelledby="share-waitlist">
      <Heading level="section" id="share-waitlist">
        {t('waitlistHeading')}
      </Heading>
      <p className={styles.lead}>{t('waitlistLead')}</p>
      <QueryState
        query={waitlist}
        loading={t('waitlistLoading')}
        error={t('waitlistFailed')}
        isEmpty={(w) => w.species.length === 0}
        empty={t('waitlistEmpty')}
      >
        {(w) =>
          w.species.map((s) => (
            <section key={s.speciesSlug} aria-labelledby={`wait-${s.speciesSlug}`}>
              <Heading level="card" id={`wait-${s.speciesSlug}`}>
                {t('waitlistSpecies', { name: s.commonName, count: s.remaining })}
              </Heading>
              <div
                className={styles.scroller}
                role="region"
                aria-label={t('waitlistFor', { name: s.commonName })}
                tabIndex={0}
              >
                <Table className={styles.table} aria-labelledby={`wait-${s.speciesSlug}`}>
                  <TableHeader>
                    <TableRow>
                      <TableHeaderCell>{t('position')}</TableHeaderCell>
                      <TableHeaderCell>{t('household')}</TableHeaderCell>
                      <TableHeaderCell>{t('asked')}</TableHeaderCell>
                      <TableHeaderCell>{t('waitStatus')}</TableHeaderCell>
                    </TableRow>
                  </TableHeader>
                  <TableBody>
                    {s.entries.map((e, i) => (
                      <TableRow key={i}>
                        <TableCell>{e.position > 0 ? e.position : '–'}</TableCell>
                        <TableCell>
                          {e.name ?? t('nameGone')}
                          {e.email ? <span className={styles.scientific}>{e.email}</span> : null}
                        </TableCell>
                        <TableCell>{e.count}</TableCell>
                        <TableCell>
                          {t(`waitStatusWords.${e.status}`)}
                          {e.status === 'offered' && e.heldUntil
                            ? `, ${t('heldUntil', { when: heldWords(e.heldUntil, locale) })}`
                            : ''}
                          {e.status === 'offered' ? ` (${e.held})` : ''}
                        </TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              </div>
            </section>
          ))
        }
      </QueryState>
    </ContentCard>
  );
}
