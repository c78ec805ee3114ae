import { Button, MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import type { ReservationCreated, WaitlistOfferView } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useClaimOfferMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { waitlistOfferQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { EmptyState, ErrorState, QueryState } from '../../../components/states/index.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { LOCALE_TAGS, useLocale } from '../../../lib/i18n/index.js';
import { shareDateWords } from '../utils/share-facts.js';
import { Confirmation } from './confirmation.js';
import { SlotPicker } from './slot-picker.js';
import { useTranslation } from 'react-i18next';

// When the hold ends, in the reader's own time zone and language: "Monday, June 7, 6:00 PM".
const HELD_UNTIL: Intl.DateTimeFormatOptions = {
  weekday: 'long',
  month: 'long',
  day: 'numeric',
  hour: 'numeric',
  minute: '2-digit',
};

const useStyles = makeStyles({
  form: { display: 'grid', gap: tokens.spacingVerticalL },
  submit: { justifySelf: 'start', minHeight: '44px' },
});

/** A waitlist offer opened by the link in its e-mail: the plants held, a pickup slot, one button. */
export function WaitlistOffer({ token }: { token: string }) {
  const { t } = useTranslation('taker');
  const offer = useQuery(waitlistOfferQueryOptions(token));
  const [claimed, setClaimed] = useState<ReservationCreated | null>(null);
  if (claimed) return <Confirmation reservation={claimed} />;
  return (
    <QueryState
      query={offer}
      loading={t('offerLoading')}
      error={(error, retry) =>
        isApiRequestError(error) && [403, 404, 410].includes(error.statusCode) ? (
          <EmptyState title={t('offerBadLink')} />
        ) : (
          <ErrorState title={t('offerFailed')} message={error.message} onRetry={retry} />
        )
      }
    >
      {(o) => <Offer token={token} offer={o} onClaimed={setClaimed} />}
    </QueryState>
  );
}

function Offer({
  token,
  offer,
  onClaimed,
}: {
  token: string;
  offer: WaitlistOfferView;
  onClaimed: (r: ReservationCreated) => void;
}) {
  const { t } = useTranslation('taker');
  const { locale } = useLocale();
  const styles = useStyles();
  const claim = useClaimOfferMutation(token, offer.share.groupSlug);
  const open = offer.slots.filter((s) => !s.past && s.left > 0);
  // The claim always names a slot; when the plants join a reservation the API ignores it.
  const [slotId, setSlotId] = useState(offer.joinsReservation ? (offer.slots[0]?.id ?? '') : '');
  const [slotError, setSlotError] = useState<string | undefined>();

  const take = () => {
    if (!slotId) return setSlotError(t('noSlot'));
    claim.mutate({ slotId }, { onSuccess: onClaimed });
  };

  return (
    <>
      <PageIntro title={t('offerTitle')}>
        {t('offerLead', {
          count: offer.count,
          name: offer.commonName,
          group: offer.share.groupName,
          date: shareDateWords(offer.share.date, locale),
        })}
      </PageIntro>
      <ContentCard aria-label={t('offerTitle')}>
        {offer.status === 'claimed' ? (
          <p>{t('offerClaimed')}</p>
        ) : offer.status === 'expired' ? (
          <p>{t('offerExpired')}</p>
        ) : (
          <div className={styles.form}>
            {offer.heldUntil ? (
              <p>
                {t('offerHeldUntil', {
                  when: new Intl.DateTimeFormat(LOCALE_TAGS[locale], HELD_UNTIL).format(new Date(offer.heldUntil)),
                })}
              </p>
            ) : null}
            {offer.joinsReservation ? (
              <p>{t('offerJoins')}</p>
            ) : (
              <SlotPicker
                slots={open}
                value={slotId}
                onChange={(id) => (setSlotId(id), setSlotError(undefined))}
                error={slotError}
              />
            )}
            {claim.isError ? (
              <MessageBar intent="error">
                <MessageBarBody>{claim.error.message}</MessageBarBody>
              </MessageBar>
            ) : null}
            <Button className={styles.submit} appearance="primary" onClick={take} disabled={claim.isPending}>
              {claim.isPending ? t('offerClaiming') : t('offerClaim')}
            </Button>
          </div>
        )}
      </ContentCard>
    </>
  );
}
