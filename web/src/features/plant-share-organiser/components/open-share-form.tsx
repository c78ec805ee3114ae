import { Button, Field, Input, MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { AddRegular, DeleteRegular } from '@fluentui/react-icons';
import { type FormEvent, useState } from 'react';
import { useOpenShareMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { SchemaTextField } from '../../../components/forms/schema-text-field.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { ApiRequestError, isApiRequestError } from '../../../lib/api-request-error.js';
import { asSentence, failureFromApi } from '../../../lib/forms/field-errors.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { useTranslation } from 'react-i18next';
import { useSlotCheckWords } from '../hooks/use-slot-check-words.js';
import { checkSlots, shareSettingsSchema, type SlotRow, type SlotRowErrors, toOpenShare } from '../utils/share-form.js';

const useStyles = makeStyles({
  form: { display: 'grid', gap: tokens.spacingVerticalL, maxWidth: '40rem' },
  pair: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1fr)',
    gap: tokens.spacingHorizontalL,
    // On a phone the two limits stack: their labels are long (more so in Spanish) and the boxes need room.
    '@media (max-width: 480px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  slot: {
    display: 'grid',
    gridTemplateColumns: '1fr 1fr 1fr auto',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    '@media (max-width: 480px)': { gridTemplateColumns: '1fr 1fr' },
  },
  lead: { margin: 0, color: tokens.colorNeutralForeground2 },
  submit: { justifySelf: 'start', minHeight: '44px' },
});

/** The API's field names for the form's own text boxes. */
const API_FIELDS: Record<string, string> = {
  date: 'date',
  'place.name': 'placeName',
  'place.address': 'address',
  'place.directions': 'directions',
  'limits.perSpecies': 'perSpecies',
  'limits.total': 'total',
  whatToBring: 'whatToBring',
};

/** The API's 400 with its field names turned into the form's; slot rows are shown beside their row instead. */
export function renameFields(error: unknown): unknown {
  if (!isApiRequestError(error)) return error;
  const fields = (error.fields ?? [])
    .filter((f) => !f.field.startsWith('slots.'))
    .map((f) => ({ ...f, field: API_FIELDS[f.field] ?? f.field }));
  return new ApiRequestError({ statusCode: error.statusCode, error: error.error, message: error.message, fields });
}

/** Opens the season's plant share: the day, place, pickup slots and limits (stock comes from the season). */
export function OpenShareForm({ groupSlug, defaultDate }: { groupSlug: string; defaultDate?: string }) {
  const { t } = useTranslation('organiser');
  const slotCheck = useSlotCheckWords();
  const styles = useStyles();
  const open = useOpenShareMutation(groupSlug);
  const form = useSchemaForm({
    schema: shareSettingsSchema,
    initial: {
      date: defaultDate ?? '',
      placeName: '',
      address: '',
      directions: '',
      perSpecies: '3',
      total: '10',
      whatToBring: '',
    },
  });
  const [rows, setRows] = useState<SlotRow[]>([{ start: '09:00', end: '09:30', capacity: '10' }]);
  const [rowErrors, setRowErrors] = useState<SlotRowErrors[]>([]);
  const [slotsMessage, setSlotsMessage] = useState<string | undefined>();

  const setRow = (i: number, patch: Partial<SlotRow>) => {
    setRows((r) => r.map((row, j) => (j === i ? { ...row, ...patch } : row)));
    setRowErrors((e) => e.map((err, j) => (j === i ? {} : err)));
  };

  const submit = (event: FormEvent) => {
    const slots = checkSlots(form.values.date, rows, slotCheck);
    setRowErrors('errors' in slots ? slots.errors : []);
    setSlotsMessage('errors' in slots ? slots.message : undefined);
    form.handleSubmit((settings) => {
      if (!('slots' in slots)) return;
      open.mutate(toOpenShare(settings, slots.slots), {
        // Nothing was opened: each of the API's field messages goes beside its box or slot row.
        onError: (error) => {
          if (isApiRequestError(error)) {
            const byRow: SlotRowErrors[] = rows.map(() => ({}));
            for (const f of error.fields ?? []) {
              const m = /^slots\.(\d+)\.(start|end|capacity)$/.exec(f.field);
              if (m) byRow[Number(m[1])][m[2] as keyof SlotRow] ??= asSentence(f.message);
            }
            setRowErrors(byRow);
          }
          form.fail(error, (e, fields) => failureFromApi(renameFields(e), fields));
        },
      });
    })(event);
  };

  return (
    <ContentCard aria-labelledby="open-share">
      <Heading level="section" id="open-share">
        {t('openHeading')}
      </Heading>
      <form ref={form.formRef} className={styles.form} onSubmit={submit} noValidate aria-labelledby="open-share">
        <p className={styles.lead}>{t('noShareYet')}</p>
        <SchemaTextField form={form} name="date" label={t('date')} type="date" required />
        <SchemaTextField form={form} name="placeName" label={t('placeName')} hint={t('placeHint')} required />
        <SchemaTextField form={form} name="address" label={t('address')} required autoComplete="street-address" />
        <SchemaTextField form={form} name="directions" label={t('directions')} hint={t('directionsHint')} />
        <SchemaTextField form={form} name="whatToBring" label={t('whatToBring')} hint={t('whatToBringHint')} />
        <div className={styles.pair}>
          <SchemaTextField form={form} name="perSpecies" label={t('limitPerSpecies')} required />
          <SchemaTextField form={form} name="total" label={t('limitTotal')} required />
        </div>
        <section aria-labelledby="slots-heading">
          <Heading level="card" id="slots-heading">
            {t('slotsHeading')}
          </Heading>
          <p className={styles.lead}>{t('slotsLead')}</p>
          {rows.map((row, i) => (
            <div key={i} className={styles.slot}>
              <SlotInput
                label={t('slotStart', { n: i + 1 })}
                type="time"
                value={row.start}
                error={rowErrors[i]?.start}
                onChange={(v) => setRow(i, { start: v })}
              />
              <SlotInput
                label={t('slotEnd', { n: i + 1 })}
                type="time"
                value={row.end}
                error={rowErrors[i]?.end}
                onChange={(v) => setRow(i, { end: v })}
              />
              <SlotInput
                label={t('slotCapacity', { n: i + 1 })}
                value={row.capacity}
                error={rowErrors[i]?.capacity}
                onChange={(v) => setRow(i, { capacity: v })}
              />
              <Button
                icon={<DeleteRegular />}
                aria-label={t('removeSlot', { n: i + 1 })}
                disabled={rows.length === 1}
                onClick={() => (setRows((r) => r.filter((_, j) => j !== i)), setRowErrors([]))}
              />
            </div>
          ))}
          {slotsMessage ? (
            <MessageBar intent="error">
              <MessageBarBody>{slotsMessage}</MessageBarBody>
            </MessageBar>
          ) : null}
          <Button icon={<AddRegular />} onClick={() => setRows((r) => [...r, nextSlot(r[r.length - 1])])}>
            {t('addSlot')}
          </Button>
        </section>
        {form.failure ? (
          <MessageBar intent="error">
            <MessageBarBody>{form.failure}</MessageBarBody>
          </MessageBar>
        ) : null}
        <Button className={styles.submit} type="submit" appearance="primary" disabled={open.isPending}>
          {open.isPending ? t('saving') : t('openSubmit')}
        </Button>
      </form>
    </ContentCard>
  );
}

function SlotInput(props: {
  label: string;
  value: string;
  type?: 'time';
  error?: string;
  onChange: (value: string) => void;
}) {
  return (
    <Field label={props.label} validationMessage={props.error} validationState={props.error ? 'error' : 'none'}>
      <Input type={props.type} value={props.value} onChange={(_, d) => props.onChange(d.value)} />
    </Field>
  );
}

/** A new slot starts where the last one ended and lasts as long. */
function nextSlot(last: SlotRow | undefined): SlotRow {
  if (!last) return { start: '09:00', end: '09:30', capacity: '10' };
  const minutes = (t: string) => Number(t.slice(0, 2)) * 60 + Number(t.slice(3, 5));
  const clock = (m: number) => `${String(Math.floor(m / 60) % 24).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
  const length = Math.max(10, minutes(last.end) - minutes(last.start)) || 30;
  return { start: last.end, end: clock(minutes(last.end) + length), capacity: last.capacity };
}
