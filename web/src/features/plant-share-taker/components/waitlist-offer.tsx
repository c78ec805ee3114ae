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
import { shareDateWords } from '../utils/share-facts.js';
import { TAKER_WORDS as W } from '../utils/taker-words.js';
import { Confirmation } from './confirmation.js';
import { SlotPicker } from './slot-picker.js';

const HELD_UNTIL = new Intl.DateTimeFormat('en-US', {
  weekday: 'long',
  month: 'long',
  day: 'numeric',
  hour: 'numeric',
  minute: '2-digit',
});

const useStyles = makeStyles({
  form: { display: 'grid', gap: tokens.spacingVerticalL },
  submit: { justifySelf: 'start', minHeight: '44px' },
});

/** A waitlist offer opened by the link in its e-mail: the plants held, a pickup slot, one button. */
export function WaitlistOffer({ token }: { token: string }) {
  const offer = useQuery(waitlistOfferQueryOptions(token));
  const [claimed, setClaimed] = useState<ReservationCreated | null>(null);
  if (claimed) return <Confirmation reservation={claimed} />;
  return (
    <QueryState
      query={offer}
      loading={W.offerLoading}
      error={(error, retry) =>
        isApiRequestError(error) && [403, 404, 410].includes(error.statusCode) ? (
          <EmptyState title={W.offerBadLink} />
        ) : (
          <ErrorState title={W.offerFailed} message={error.message} onRetry={retry} />
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
  const styles = useStyles();
  const claim = useClaimOfferMutation(token, offer.share.groupSlug);
  const open = offer.slots.filter((s) => !s.past && s.left > 0);
  // The claim always names a slot; when the plants join a reservation the API ignores it.
  const [slotId, setSlotId] = useState(offer.joinsReservation ? (offer.slots[0]?.id ?? '') : '');
  const [slotError, setSlotError] = useState<string | undefined>();

  const take = () => {
    if (!slotId) return setSlotError(W.noSlot);
    claim.mutate({ slotId }, { onSuccess: onClaimed });
  };

  return (
    <>
      <PageIntro title={W.offerTitle}>
        {W.offerLead(offer.count, offer.commonName, offer.share.groupName, shareDateWords(offer.share.date))}
      </PageIntro>
      <ContentCard aria-label={W.offerTitle}>
        {offer.status === 'claimed' ? (
          <p>{W.offerClaimed}</p>
        ) : offer.status === 'expired' ? (
          <p>{W.offerExpired}</p>
        ) : (
          <div className={styles.form}>
            {offer.heldUntil ? <p>{W.offerHeldUntil(HELD_UNTIL.format(new Date(offer.heldUntil)))}</p> : null}
            {offer.joinsReservation ? (
              <p>{W.offerJoins}</p>
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
              {claim.isPending ? W.offerClaiming : W.offerClaim}
            </Button>
          </div>
        )}
      </ContentCard>
    </>
  );
}
