import { MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import {
  type PublicPlantShare,
  type ReservationCreated,
  type ShareSpecies,
  type ShareYard,
  type Vocabulary,
} from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { TFunction } from 'i18next';
import type { Yard } from '../../../api/plant-share/plant-share.api.js';
import { useReserveMutation, useWaitlistMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { publicShareQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { Heading } from '../../../components/page/page-heading.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { EmptyState, ErrorState, QueryState } from '../../../components/states/index.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useLocale, useWords } from '../../../lib/i18n/index.js';
import { rankByFit, wildlifeLines } from '../utils/rank-by-fit.js';
import { shareDateWords } from '../utils/share-facts.js';
import { Confirmation } from './confirmation.js';
import { FitFilter } from './fit-filter.js';
import { OfferCard } from './offer-card.js';
import { ReservePanel } from './reserve-panel.js';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(min(100%, 18rem), 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  heading: { margin: 0 },
  notes: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, color: tokens.colorNeutralForeground2 },
});

/** What a group's plant share offers, the "fits my yard" ranking, and reserving. Nobody needs to sign in. */
export function AvailablePage({ groupSlug }: { groupSlug: string }) {
  const { t } = useTranslation('taker');
  const [yard, setYard] = useState<Yard>(null);
  const [confirmed, setConfirmed] = useState<ReservationCreated | null>(null);
  const share = useQuery(publicShareQueryOptions(groupSlug, yard));
  if (confirmed) return <Confirmation reservation={confirmed} />;
  return (
    <QueryState
      query={share}
      loading={t('loading')}
      error={(error, retry) =>
        isApiRequestError(error) && error.statusCode === 404 ? (
          <EmptyState title={t('notFound')} />
        ) : isApiRequestError(error) && error.statusCode === 400 && yard ? (
          // A ZIP or mix the API could not place: say why, and go back to the whole list.
          <ErrorState title={t('fitRefused')} message={error.message} onRetry={() => setYard(null)} />
        ) : (
          <ErrorState title={t('loadFailed')} message={error.message} onRetry={retry} />
        )
      }
    >
      {(s) => (
        <Available
          share={s}
          yard={yard}
          onYard={setYard}
          isRanking={share.isPlaceholderData}
          onReserved={setConfirmed}
        />
      )}
    </QueryState>
  );
}

interface AvailableProps {
  share: PublicPlantShare;
  yard: Yard;
  onYard: (yard: Yard) => void;
  /** True while the list for a new yard answer is on its way (the old one stays on screen). */
  isRanking: boolean;
  onReserved: (reservation: ReservationCreated) => void;
}

function Available({ share, yard, onYard, isRanking, onReserved }: AvailableProps) {
  const { t } = useTranslation('taker');
  const { locale } = useLocale();
  const words = useWords();
  const styles = useStyles();
  const [counts, setCounts] = useState<Record<string, number>>({});
  const reserve = useReserveMutation(share.groupSlug);
  const waitlist = useWaitlistMutation();

  const isOpen = share.status === 'open';
  const total = Object.values(counts).reduce((n, c) => n + c, 0);
  const chosen = share.species.map((s) => ({ slug: s.slug, commonName: s.commonName, count: counts[s.slug] ?? 0 }));
  const place = `${share.place.name}, ${share.place.address}`;

  const card = (s: ShareSpecies) => (
    <OfferCard
      key={s.slug}
      commonName={s.commonName}
      scientificName={s.scientificName}
      facts={{ ...s, heightMinCm: s.heightCm.min, heightMaxCm: s.heightCm.max }}
      wildlife={wildlifeLines(s.wildlife)}
      cautions={s.cautions}
      left={s.remaining}
      fit={s.fit ? { words: t(`fitWords.${s.fit.fit}`), why: s.fit.why } : null}
      count={
        isOpen
          ? {
              value: counts[s.slug] ?? 0,
              // The stepper stops at the tightest of the species limit, what is left and the household total.
              max: Math.min(share.limits.perSpecies, s.remaining, (counts[s.slug] ?? 0) + share.limits.total - total),
              onChange: (n) => setCounts((c) => ({ ...c, [s.slug]: n })),
            }
          : undefined
      }
    />
  );

  return (
    <>
      <PageIntro title={t('availableTitle', { group: share.groupName })}>
        {t('availableLead', { date: shareDateWords(share.date, locale), place })}{' '}
        {t('limits', { perSpecies: share.limits.perSpecies, total: share.limits.total })}
        {share.whatToBring ? ` ${t('bringLine', { what: share.whatToBring })}` : null}
      </PageIntro>
      <div className={styles.stack}>
        {share.status === 'open' ? null : (
          <MessageBar intent="info">
            <MessageBarBody>{t(`notOpen.${share.status}`)}</MessageBarBody>
          </MessageBar>
        )}
        <FitFilter onApply={onYard} onClear={() => onYard(null)} isActive={yard !== null} isPending={isRanking} />
        <section aria-labelledby="on-offer" className={styles.stack} aria-busy={isRanking}>
          <Heading level="section" id="on-offer" className={styles.heading}>
            {t('onOfferHeading')}
          </Heading>
          {share.yard ? <p className={styles.heading}>{rankedFor(share.yard, words, t)}</p> : null}
          {rankByFit(share.species).map(({ group, species }) => (
            <div key={group} className={styles.stack}>
              {group === 'less-suited' ? <Heading level="card">{t('notSuited')}</Heading> : null}
              <div className={styles.grid}>{species.map(card)}</div>
            </div>
          ))}
          {share.notes.length > 0 ? (
            <div>
              <Heading level="card">{t('safetyHeading')}</Heading>
              <ul className={styles.notes}>
                {share.notes.map((n) => (
                  <li key={n}>{n}</li>
                ))}
              </ul>
            </div>
          ) : null}
        </section>
        {isOpen ? (
          <ReservePanel
            slots={share.slots}
            chosen={chosen}
            limitTotal={share.limits.total}
            isPending={reserve.isPending}
            // The confirmation focuses its heading, which also brings it into view.
            onReserve={(input) => reserve.mutateAsync(input).then(onReserved)}
            onWaitlist={(path, body) => waitlist.mutateAsync({ path, body })}
          />
        ) : null}
      </div>
    </>
  );
}

/** What the list is ranked for, in words: the spot, and the place (and the mix) it came from. */
function rankedFor(yard: ShareYard, words: Vocabulary, t: TFunction<'taker'>): string {
  const spot = words.describeGround(yard.sun, yard.moisture);
  if (yard.from === 'mix' && yard.mixName) return t('fitForMix', { name: yard.mixName, spot, place: yard.place });
  return yard.from === 'zip' ? t('fitForPlace', { spot, place: yard.place }) : t('fitFor', { spot });
}
