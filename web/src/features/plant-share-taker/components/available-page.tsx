import { MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { useMutation, useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { getShareFit } from '../../../api/plant-share/plant-share.api.js';
import { useReserveMutation, useWaitlistMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { publicShareQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import type { FitResult, PublicShare, Reservation } from '../../../api/plant-share/plant-share.types.js';
import { Heading } from '../../../components/page/page-heading.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { EmptyState, ErrorState, QueryState } from '../../../components/states/index.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { rankByFit } from '../utils/rank-by-fit.js';
import { shareDateWords } from '../utils/share-facts.js';
import { TAKER_WORDS as W } from '../utils/taker-words.js';
import { Confirmation } from './confirmation.js';
import { FitFilter, type YardAnswer } from './fit-filter.js';
import { OfferCard } from './offer-card.js';
import { ReservePanel } from './reserve-panel.js';

const useStyles = makeStyles({
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(min(100%, 18rem), 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  heading: { margin: 0 },
});

/** What a group's plant share offers, the "fits my yard" ranking, and reserving. Nobody needs to sign in. */
export function AvailablePage({ groupSlug }: { groupSlug: string }) {
  const share = useQuery(publicShareQueryOptions(groupSlug));
  return (
    <QueryState
      query={share}
      loading={W.loading}
      error={(error, retry) =>
        isApiRequestError(error) && error.statusCode === 404 ? (
          <EmptyState title={W.notFound} />
        ) : (
          <ErrorState title={W.loadFailed} message={error.message} onRetry={retry} />
        )
      }
    >
      {(s) => <Available share={s} />}
    </QueryState>
  );
}

function Available({ share }: { share: PublicShare }) {
  const styles = useStyles();
  const [counts, setCounts] = useState<Record<string, number>>({});
  const [confirmed, setConfirmed] = useState<Reservation | null>(null);
  const fit = useMutation({ mutationFn: (answer: YardAnswer) => getShareFit(share.groupSlug, answer) });
  const [fitResult, setFitResult] = useState<FitResult | null>(null);
  const reserve = useReserveMutation(share.groupSlug);
  const waitlist = useWaitlistMutation(share.groupSlug);

  if (confirmed) return <Confirmation reservation={confirmed} />;

  const isOpen = share.status === 'open';
  const total = Object.values(counts).reduce((n, c) => n + c, 0);
  const ordered = rankByFit(share.species, fitResult);
  const chosen = share.species.map((s) => ({ slug: s.slug, commonName: s.commonName, count: counts[s.slug] ?? 0 }));

  const applyFit = (answer: YardAnswer) =>
    fit.mutate(answer, { onSuccess: setFitResult, onError: () => setFitResult(null) });

  return (
    <>
      <PageIntro title={W.availableTitle(share.groupName)}>
        {W.availableLead(shareDateWords(share.date), share.place)} {W.limits(share.limitPerSpecies, share.limitTotal)}
      </PageIntro>
      <div className={styles.stack}>
        {share.status === 'open' ? null : (
          <MessageBar intent="info">
            <MessageBarBody>{W.notOpen[share.status]}</MessageBarBody>
          </MessageBar>
        )}
        <FitFilter
          onApply={applyFit}
          onClear={() => setFitResult(null)}
          isActive={fitResult !== null}
          isPending={fit.isPending}
        />
        {fit.isError ? (
          <MessageBar intent="error">
            <MessageBarBody>
              {W.fitFailed} {fit.error.message}
            </MessageBarBody>
          </MessageBar>
        ) : null}
        <section aria-labelledby="on-offer" className={styles.stack}>
          <Heading level="section" id="on-offer" className={styles.heading}>
            {W.onOfferHeading}
          </Heading>
          {ordered.map(({ group, items }) => (
            <div key={group} className={styles.stack}>
              {group === 'less-suited' ? <Heading level="card">{W.notSuited}</Heading> : null}
              <div className={styles.grid}>
                {items.map(({ species: s, why }) => (
                  <OfferCard
                    key={s.slug}
                    commonName={s.commonName}
                    scientificName={s.scientificName}
                    facts={s}
                    wildlife={s.wildlife}
                    cautions={s.cautions}
                    left={s.left}
                    why={why}
                    count={
                      isOpen
                        ? {
                            value: counts[s.slug] ?? 0,
                            // The stepper stops at the tighter of the species limit, what is left and the household total.
                            max: Math.min(
                              share.limitPerSpecies,
                              s.left,
                              (counts[s.slug] ?? 0) + share.limitTotal - total,
                            ),
                            onChange: (n) => setCounts((c) => ({ ...c, [s.slug]: n })),
                          }
                        : undefined
                    }
                  />
                ))}
              </div>
            </div>
          ))}
        </section>
        {isOpen ? (
          <ReservePanel
            slots={share.slots}
            chosen={chosen}
            limitTotal={share.limitTotal}
            isPending={reserve.isPending}
            onReserve={(input) =>
              // The confirmation focuses its heading, which also brings it into view.
              reserve.mutateAsync(input).then(setConfirmed)
            }
            onWaitlist={(input) => waitlist.mutateAsync(input)}
          />
        ) : null}
      </div>
    </>
  );
}
