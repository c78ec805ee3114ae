import { Button, MessageBar, MessageBarActions, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { type ReservationRequest, type WaitlistRequest } from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { SchemaTextField } from '../../../components/forms/schema-text-field.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useWords } from '../../../lib/i18n/index.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { takerDetailsSchema } from '../utils/taker-details.js';
import { type SlotChoice, SlotPicker } from './slot-picker.js';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  form: { display: 'grid', gap: tokens.spacingVerticalL },
  lead: { margin: 0, color: tokens.colorNeutralForeground2 },
  details: { display: 'grid', gap: tokens.spacingVerticalM, maxWidth: '28rem' },
  submit: { minHeight: '44px', justifySelf: 'start' },
  chosen: { margin: 0, fontWeight: tokens.fontWeightSemibold },
});

export interface ChosenPlant {
  slug: string;
  commonName: string;
  count: number;
}

/** What the panel sends: the taker's details, the slot and the plants (a shared `ReservationRequest`). */
export type ReserveInput = ReservationRequest;

export interface ReservePanelProps {
  slots: readonly SlotChoice[];
  chosen: readonly ChosenPlant[];
  limitTotal: number;
  isPending: boolean;
  /** Sends the reservation; rejects with the API's error (a 409 when plants ran out). */
  onReserve: (input: ReserveInput) => Promise<unknown>;
  /** Puts the taker on the waitlist for the plants that ran out, at the path the 409 offered. */
  onWaitlist: (path: string, body: WaitlistRequest) => Promise<unknown>;
}

/** The pickup slot and the taker's name, e-mail and ZIP, then one button to reserve. */
export function ReservePanel({ slots, chosen, limitTotal, isPending, onReserve, onWaitlist }: ReservePanelProps) {
  const { t } = useTranslation('taker');
  const words = useWords();
  const styles = useStyles();
  const form = useSchemaForm({ schema: takerDetailsSchema, initial: { name: '', email: '', zip: '' } });
  const [slotId, setSlotId] = useState('');
  const [slotError, setSlotError] = useState<string | undefined>();
  const [plantsError, setPlantsError] = useState<string | null>(null);
  const [waitlist, setWaitlist] = useState<{ path: string; body: WaitlistRequest; names: string[] } | null>(null);
  const [waitlisted, setWaitlisted] = useState(false);
  const total = chosen.reduce((n, p) => n + p.count, 0);

  const submit = (event: FormEvent) => {
    const noPlants = total === 0;
    const noSlot = slotId === '';
    setPlantsError(noPlants ? t('noPlantsChosen') : total > limitTotal ? t('overTotal', { count: limitTotal }) : null);
    setSlotError(noSlot ? t('noSlot') : undefined);
    setWaitlist(null);
    form.handleSubmit((details) => {
      if (noPlants || noSlot || total > limitTotal) return;
      const lines = chosen.filter((p) => p.count > 0).map((p) => ({ speciesSlug: p.slug, count: p.count }));
      const input: ReserveInput = { ...details, slotId, lines };
      onReserve(input).catch((error: unknown) => {
        // A 409 with an offer: nothing was reserved; the taker may wait for the species that ran out.
        if (isApiRequestError(error) && error.statusCode === 409 && error.waitlist) {
          const out = new Set(error.waitlist.speciesSlugs);
          const ranOut = chosen.filter((p) => p.count > 0 && out.has(p.slug));
          setWaitlist({
            path: error.waitlist.path,
            body: { ...details, lines: lines.filter((l) => out.has(l.speciesSlug)) },
            names: ranOut.map((p) => p.commonName),
          });
          return;
        }
        form.fail(error);
      });
    })(event);
  };

  const joinList = () => {
    if (!waitlist) return;
    onWaitlist(waitlist.path, waitlist.body)
      .then(() => (setWaitlisted(true), setWaitlist(null)))
      .catch((error: unknown) => form.fail(error));
  };

  return (
    <ContentCard aria-labelledby="reserve-heading">
      <Heading level="section" id="reserve-heading">
        {t('reserveHeading')}
      </Heading>
      <form ref={form.formRef} className={styles.form} onSubmit={submit} noValidate aria-labelledby="reserve-heading">
        <p className={styles.chosen} aria-live="polite">
          {t('chosen', { chosen: total, count: limitTotal })}
        </p>
        {plantsError ? (
          <MessageBar intent="error">
            <MessageBarBody>{plantsError}</MessageBarBody>
          </MessageBar>
        ) : null}
        <SlotPicker
          slots={slots}
          value={slotId}
          onChange={(id) => (setSlotId(id), setSlotError(undefined))}
          error={slotError}
        />
        <div className={styles.details}>
          <Heading level="card">{t('yourDetails')}</Heading>
          <p className={styles.lead}>{t('detailsLead')}</p>
          <SchemaTextField form={form} name="name" label={t('name')} required autoComplete="name" />
          <SchemaTextField form={form} name="email" label={t('email')} type="email" required autoComplete="email" />
          <SchemaTextField form={form} name="zip" label={t('zip')} required autoComplete="postal-code" />
        </div>
        {form.failure ? (
          <MessageBar intent="error">
            <MessageBarBody>{form.failure}</MessageBarBody>
          </MessageBar>
        ) : null}
        {waitlist ? (
          <MessageBar intent="warning" layout="multiline">
            <MessageBarBody>
              {t('allTaken')} {t('waitlistOffer', { names: words.join(waitlist.names) })}
            </MessageBarBody>
            <MessageBarActions>
              <Button onClick={joinList}>{t('joinWaitlist')}</Button>
            </MessageBarActions>
          </MessageBar>
        ) : null}
        {waitlisted ? (
          <MessageBar intent="success">
            <MessageBarBody>{t('joinedWaitlist')}</MessageBarBody>
          </MessageBar>
        ) : null}
        <Button className={styles.submit} type="submit" appearance="primary" disabled={isPending}>
          {isPending ? t('reserving') : t('reserve')}
        </Button>
      </form>
    </ContentCard>
  );
}
