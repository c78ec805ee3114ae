import { Button, MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import type { PublicPlantShare, TakerReservation } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import {
  useCancelReservationMutation,
  useChangeReservationMutation,
} from '../../../api/plant-share/plant-share.mutations.js';
import { publicShareQueryOptions, reservationQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { EmptyState, ErrorState, QueryState } from '../../../components/states/index.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { CountStepper } from '../../../components/forms/count-stepper.js';
import { ReservationSummary } from './reservation-summary.js';
import { SlotPicker } from './slot-picker.js';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  rows: { listStyle: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalM },
  row: { display: 'flex', justifyContent: 'space-between', alignItems: 'center', gap: tokens.spacingHorizontalM },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM, marginTop: tokens.spacingVerticalL },
  big: { minHeight: '44px' },
});

/** A reservation opened by the private link in its e-mail: see it, change counts or slot, or cancel. */
export function MyReservation({ token }: { token: string }) {
  const { t } = useTranslation('taker');
  const reservation = useQuery(reservationQueryOptions(token));
  return (
    <QueryState
      query={reservation}
      loading={t('myReservationLoading')}
      error={(error, retry) =>
        isApiRequestError(error) && [403, 404].includes(error.statusCode) ? (
          <EmptyState title={t('badLink')} />
        ) : (
          <ErrorState title={t('myReservationFailed')} message={error.message} onRetry={retry} />
        )
      }
    >
      {(r) => <ReservationView token={token} reservation={r} />}
    </QueryState>
  );
}

function ReservationView({ token, reservation }: { token: string; reservation: TakerReservation }) {
  const { t } = useTranslation('taker');
  const styles = useStyles();
  const share = useQuery({ ...publicShareQueryOptions(reservation.share.groupSlug), enabled: reservation.canChange });
  return (
    <>
      <PageIntro title={t('myReservationTitle')}>{reservation.share.groupName}</PageIntro>
      <div className={styles.stack}>
        {reservation.status === 'cancelled' ? (
          <MessageBar intent="info">
            <MessageBarBody>{t('cancelled')}</MessageBarBody>
          </MessageBar>
        ) : null}
        {reservation.status === 'picked-up' ? (
          <MessageBar intent="success">
            <MessageBarBody>{t('pickedUp')}</MessageBarBody>
          </MessageBar>
        ) : null}
        {reservation.status === 'no-show' ? (
          <MessageBar intent="info">
            <MessageBarBody>{t('noShow')}</MessageBarBody>
          </MessageBar>
        ) : null}
        {reservation.status === 'confirmed' && !reservation.canChange ? (
          <MessageBar intent="info">
            <MessageBarBody>{t('cannotChange')}</MessageBarBody>
          </MessageBar>
        ) : null}
        {reservation.status === 'cancelled' ? null : <ReservationSummary reservation={reservation} />}
        {reservation.canChange && share.data ? (
          <ChangeReservation token={token} reservation={reservation} share={share.data} />
        ) : null}
      </div>
    </>
  );
}

interface ChangeProps {
  token: string;
  reservation: TakerReservation;
  share: PublicPlantShare;
}

/** New counts and another slot, saved in one request; or cancel after saying yes twice. */
function ChangeReservation({ token, reservation, share }: ChangeProps) {
  const { t } = useTranslation('taker');
  const styles = useStyles();
  const change = useChangeReservationMutation(token, share.groupSlug);
  const cancel = useCancelReservationMutation(token, share.groupSlug);
  const mine = Object.fromEntries(reservation.lines.map((l) => [l.speciesSlug, l.count]));
  const [counts, setCounts] = useState<Record<string, number>>(mine);
  const [slotId, setSlotId] = useState(reservation.slot.id);
  const [asking, setAsking] = useState(false);
  const [saved, setSaved] = useState(false);
  const total = Object.values(counts).reduce((n, c) => n + c, 0);
  const failure = change.error ?? cancel.error;

  const save = () => {
    setSaved(false);
    const lines = Object.entries(counts)
      .filter(([, n]) => n > 0)
      .map(([speciesSlug, count]) => ({ speciesSlug, count }));
    change.mutate({ slotId, lines }, { onSuccess: () => setSaved(true) });
  };

  return (
    <ContentCard aria-labelledby="change-heading">
      <Heading level="section" id="change-heading">
        {t('changeHeading')}
      </Heading>
      <div className={styles.stack}>
        <ul className={styles.rows}>
          {share.species.map((s) => {
            const held = mine[s.slug] ?? 0;
            const value = counts[s.slug] ?? 0;
            // Plants this reservation already holds count as available to it.
            const max = Math.min(share.limits.perSpecies, s.remaining + held, value + share.limits.total - total);
            if (held === 0 && s.remaining === 0) return null;
            return (
              <li key={s.slug} className={styles.row}>
                <span>{s.commonName}</span>
                <CountStepper
                  label={t('countLabel', { name: s.commonName })}
                  value={value}
                  max={max}
                  onChange={(n) => setCounts((c) => ({ ...c, [s.slug]: n }))}
                />
              </li>
            );
          })}
        </ul>
        <SlotPicker
          // The taker's own slot stays choosable even when it is full: they hold one of its places.
          slots={share.slots.map((s) => (s.id === reservation.slot.id ? { ...s, left: Math.max(1, s.left) } : s))}
          value={slotId}
          onChange={setSlotId}
        />
        {failure ? (
          <MessageBar intent="error">
            <MessageBarBody>{failure.message}</MessageBarBody>
          </MessageBar>
        ) : null}
        {saved ? (
          <MessageBar intent="success">
            <MessageBarBody>{t('saved')}</MessageBarBody>
          </MessageBar>
        ) : null}
        {asking ? (
          <MessageBar intent="warning" layout="multiline">
            <MessageBarBody>{t('cancelQuestion')}</MessageBarBody>
          </MessageBar>
        ) : null}
        <div className={styles.actions}>
          {asking ? (
            <>
              <Button className={styles.big} onClick={() => cancel.mutate()} disabled={cancel.isPending}>
                {t('cancelConfirm')}
              </Button>
              <Button className={styles.big} appearance="primary" onClick={() => setAsking(false)}>
                {t('keep')}
              </Button>
            </>
          ) : (
            <>
              <Button
                className={styles.big}
                appearance="primary"
                onClick={save}
                disabled={change.isPending || total === 0}
              >
                {t('saveChanges')}
              </Button>
              <Button className={styles.big} onClick={() => setAsking(true)}>
                {t('cancel')}
              </Button>
            </>
          )}
        </div>
      </div>
    </ContentCard>
  );
}
