import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { shareWaitlistQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { ORGANISER_WORDS as W } from '../utils/organiser-words.js';
import { useOrganiserStyles } from './organiser.styles.js';

const heldWords = (iso: string) =>
  new Intl.DateTimeFormat('en-US', {
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
  const styles = useOrganiserStyles();
  const waitlist = useQuery(shareWaitlistQueryOptions(groupSlug));
  return (
    <ContentCard aria-labelledby="share-waitlist">
      <Heading level="section" id="share-waitlist">
        {W.waitlistHeading}
      </Heading>
      <p className={styles.lead}>{W.waitlistLead}</p>
      <QueryState
        query={waitlist}
        loading={W.waitlistLoading}
        error={W.waitlistFailed}
        isEmpty={(w) => w.species.length === 0}
        empty={W.waitlistEmpty}
      >
        {(w) =>
          w.species.map((s) => (
            <section key={s.speciesSlug} aria-labelledby={`wait-${s.speciesSlug}`}>
              <Heading level="card" id={`wait-${s.speciesSlug}`}>
                {W.waitlistSpecies(s.commonName, s.remaining)}
              </Heading>
              <div
                className={styles.scroller}
                role="region"
                aria-label={`${W.waitlistHeading}: ${s.commonName}`}
                tabIndex={0}
              >
                <Table className={styles.table} aria-labelledby={`wait-${s.speciesSlug}`}>
                  <TableHeader>
                    <TableRow>
                      <TableHeaderCell>{W.position}</TableHeaderCell>
                      <TableHeaderCell>{W.household}</TableHeaderCell>
                      <TableHeaderCell>{W.asked}</TableHeaderCell>
                      <TableHeaderCell>{W.waitStatus}</TableHeaderCell>
                    </TableRow>
                  </TableHeader>
                  <TableBody>
                    {s.entries.map((e, i) => (
                      <TableRow key={i}>
                        <TableCell>{e.position > 0 ? e.position : '–'}</TableCell>
                        <TableCell>
                          {e.name ?? W.nameGone}
                          {e.email ? <span className={styles.scientific}>{e.email}</span> : null}
                        </TableCell>
                        <TableCell>{e.count}</TableCell>
                        <TableCell>
                          {W.waitStatusWords[e.status]}
                          {e.status === 'offered' && e.heldUntil ? `, ${W.heldUntil(heldWords(e.heldUntil))}` : ''}
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
