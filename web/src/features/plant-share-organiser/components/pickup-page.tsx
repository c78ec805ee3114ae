import { Button, Field, MessageBar, MessageBarBody, Select } from '@fluentui/react-components';
import { PrintRegular } from '@fluentui/react-icons';
import type { PickupList, PlantShare } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useCheckInMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { pickupListQueryOptions, shareQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { ErrorState, QueryState } from '../../../components/states/index.js';
import { useTranslation } from 'react-i18next';
import { plantsLine } from '../utils/plants-line.js';
import { useLocale } from '../../../lib/i18n/index.js';
import { shareDateWords, slotWords } from '../utils/slot-time.js';
import { CheckInRow } from './check-in-row.js';
import { useOrganiserStyles } from './organiser.styles.js';
import { PickupListTable } from './pickup-list.js';
import { WalkUpCard } from './walk-up-card.js';

/** Pickup day for the group's organisers: one slot's printable list, check-in on a phone, and walk-up. */
export function PickupPage({ groupSlug }: { groupSlug: string }) {
  const { t } = useTranslation('organiser');
  const share = useQuery(shareQueryOptions(groupSlug));
  return (
    <QueryState query={share} loading={t('loading')} error={t('loadFailed')}>
      {(s) => <PickupDay share={s} />}
    </QueryState>
  );
}

function PickupDay({ share }: { share: PlantShare }) {
  const { t } = useTranslation('organiser');
  const { locale } = useLocale();
  const styles = useOrganiserStyles();
  const [slotId, setSlotId] = useState(share.slots[0]?.id ?? '');
  const list = useQuery({ ...pickupListQueryOptions(share.groupSlug, slotId), enabled: slotId !== '' });
  return (
    <>
      <div data-print="hide">
        <PageIntro title={t('pickupDayTitle', { date: shareDateWords(share.date, locale) })}>
          {t('pickupLead')}
        </PageIntro>
      </div>
      <div className={styles.stack} data-pickup-cards>
        <ContentCard aria-labelledby="pickup-slot">
          <Heading level="section" id="pickup-slot">
            {t('pickupHeading')}
          </Heading>
          <div data-print="hide">
            <Field label={t('slotChoice')}>
              <Select value={slotId} onChange={(_, d) => setSlotId(d.value)}>
                {share.slots.map((s) => (
                  <option key={s.id} value={s.id}>
                    {t('slotChoiceLine', {
                      slot: slotWords(s, locale),
                      booked: t('slotLine', { booked: s.booked, count: s.capacity }),
                    })}
                  </option>
                ))}
              </Select>
            </Field>
          </div>
          <QueryState query={list} loading={t('loading')} error={t('loadFailed')}>
            {(l) => (
              <>
                <PickupListTable list={l} />
                <div className={styles.actions} data-print="hide">
                  <Button icon={<PrintRegular />} onClick={() => window.print()}>
                    {t('print')}
                  </Button>
                </div>
              </>
            )}
          </QueryState>
        </ContentCard>
        {list.data ? <CheckInCard groupSlug={share.groupSlug} list={list.data} /> : null}
        <WalkUpCard share={share} />
      </div>
    </>
  );
}

/** The slot's households with big checked-in / no-show buttons, for a volunteer's phone. */
function CheckInCard({ groupSlug, list }: { groupSlug: string; list: PickupList }) {
  const { t } = useTranslation('organiser');
  const styles = useOrganiserStyles();
  const checkIn = useCheckInMutation(groupSlug);
  const [released, setReleased] = useState<number | null>(null);
  const households = list.households.filter((h) => h.status !== 'cancelled');
  return (
    <ContentCard aria-labelledby="check-in">
      <Heading level="section" id="check-in">
        {t('checkInHeading')}
      </Heading>
      <p className={styles.lead}>{t('checkInLead')}</p>
      {checkIn.isError ? <ErrorState title={t('somethingWrong')} message={checkIn.error.message} /> : null}
      {released !== null && released > 0 ? (
        <MessageBar intent="info">
          <MessageBarBody>{t('released', { count: released })}</MessageBarBody>
        </MessageBar>
      ) : null}
      {households.length === 0 ? (
        <p>{t('noReservations')}</p>
      ) : (
        <ul className={styles.rows}>
          {households.map((h) => (
            <CheckInRow
              key={h.reservationId}
              name={h.name ?? t('nameGone')}
              plantsLine={plantsLine(h.lines)}
              state={h.status}
              isPending={checkIn.isPending && checkIn.variables?.reservationId === h.reservationId}
              onMark={(outcome) =>
                checkIn.mutate(
                  { reservationId: h.reservationId, body: { outcome } },
                  { onSuccess: (r) => setReleased(r.released.reduce((n, x) => n + x.toWaitlist + x.toStock, 0)) },
                )
              }
            />
          ))}
        </ul>
      )}
    </ContentCard>
  );
}
