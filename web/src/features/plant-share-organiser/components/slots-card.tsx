import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { AddRegular, DeleteRegular, SaveRegular } from '@fluentui/react-icons';
import { MAX_SLOTS, type PickupSlot, type PlantShare } from '@homeground/shared';
import { useState } from 'react';
import {
  useAddSlotMutation,
  useDeleteSlotMutation,
  useEditSlotMutation,
} from '../../../api/plant-share/plant-share.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { asSentence } from '../../../lib/forms/field-errors.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useTranslation } from 'react-i18next';
import { useSlotCheckWords } from '../hooks/use-slot-check-words.js';
import { checkSlots, type SlotRow, type SlotRowErrors } from '../utils/share-form.js';
import { useOrganiserStyles } from './organiser.styles.js';

const useStyles = makeStyles({
  slot: {
    display: 'grid',
    gridTemplateColumns: '1fr 1fr 1fr auto auto',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    marginBottom: tokens.spacingVerticalM,
    '@media (max-width: 480px)': { gridTemplateColumns: '1fr 1fr' },
  },
  booked: { gridColumn: '1 / -1', margin: 0, color: tokens.colorNeutralForeground3 },
  noButton: { minWidth: '32px' },
});

/** "2027-06-12T09:00:00-05:00" → "09:00": the clock the organiser wrote. */
const clockOf = (value: string) => value.slice(11, 16);
const rowOf = (s: PickupSlot): SlotRow => ({
  start: clockOf(s.start),
  end: clockOf(s.end),
  capacity: String(s.capacity),
});

/**
 * The pickup slots of an open share: each row's times and households can change (never below the
 * households booked in it: the API's 400 shows beside the row), and new slots go on the share's day.
 * Every row is checked by the shared slot schema before it is sent.
 */
export function SlotsCard({ share }: { share: PlantShare }) {
  const { t } = useTranslation('organiser');
  const slotCheck = useSlotCheckWords();
  const styles = useStyles();
  const organiser = useOrganiserStyles();
  const editSlot = useEditSlotMutation(share.groupSlug);
  const addSlot = useAddSlotMutation(share.groupSlug);
  const deleteSlot = useDeleteSlotMutation(share.groupSlug);
  /** The slot the organiser asked to delete, awaiting their confirmation. */
  const [deleting, setDeleting] = useState<{ slot: PickupSlot; n: number } | null>(null);
  const [rows, setRows] = useState<Record<string, SlotRow>>(() =>
    Object.fromEntries(share.slots.map((s) => [s.id, rowOf(s)])),
  );
  const last = share.slots.at(-1);
  const [fresh, setFresh] = useState<SlotRow>({
    start: last ? clockOf(last.end) : '09:00',
    end: last ? clockOf(last.end).replace(/^(\d{2})/, (h) => String(Number(h) + 1).padStart(2, '0')) : '10:00',
    capacity: last ? String(last.capacity) : '10',
  });
  const [errors, setErrors] = useState<Record<string, SlotRowErrors>>({});
  const [note, setNote] = useState<{ intent: 'success' | 'error'; text: string } | null>(null);

  /** The row as the API's slot, or its messages beside it. */
  const checked = (key: string, row: SlotRow) => {
    const result = checkSlots(share.date, [row], slotCheck);
    if ('slots' in result) return result.slots[0];
    setErrors((e) => ({ ...e, [key]: result.errors[0] ?? {} }));
    return null;
  };
  const failed = (key: string) => (error: Error) => {
    const byField: SlotRowErrors = {};
    if (isApiRequestError(error))
      for (const f of error.fields ?? [])
        if (f.field === 'start' || f.field === 'end' || f.field === 'capacity')
          byField[f.field] = asSentence(f.message);
    setErrors((e) => ({ ...e, [key]: byField }));
    setNote({ intent: 'error', text: error.message });
  };

  const save = (slot: PickupSlot) => {
    setNote(null);
    const body = checked(slot.id, rows[slot.id]);
    if (!body) return;
    editSlot.mutate(
      { slotId: slot.id, body },
      { onSuccess: () => setNote({ intent: 'success', text: t('slotSaved') }), onError: failed(slot.id) },
    );
  };
  const add = () => {
    setNote(null);
    const body = checked('new', fresh);
    if (!body) return;
    addSlot.mutate(body, {
      onSuccess: (next) => {
        setRows(Object.fromEntries(next.slots.map((s) => [s.id, rowOf(s)])));
        setNote({ intent: 'success', text: t('slotAdded') });
      },
      onError: failed('new'),
    });
  };
  const remove = (slot: PickupSlot) => {
    setNote(null);
    setDeleting(null);
    // On success the page draws the card again from the answer, without the slot: that is the sign it went.
    deleteSlot.mutate(slot.id, { onError: (error) => setNote({ intent: 'error', text: error.message }) });
  };
  const change = (key: string, patch: Partial<SlotRow>) => {
    setErrors((e) => ({ ...e, [key]: {} }));
    if (key === 'new') setFresh((r) => ({ ...r, ...patch }));
    else setRows((r) => ({ ...r, [key]: { ...r[key], ...patch } }));
  };

  const rowFields = (key: string, n: number | null, row: SlotRow) => (
    <>
      <SlotField
        label={n ? t('slotStart', { n }) : t('newSlotStart', { n: share.slots.length + 1 })}
        type="time"
        value={row.start}
        error={errors[key]?.start}
        onChange={(v) => change(key, { start: v })}
      />
      <SlotField
        label={t('slotEnd', { n: n ?? share.slots.length + 1 })}
        type="time"
        value={row.end}
        error={errors[key]?.end}
        onChange={(v) => change(key, { end: v })}
      />
      <SlotField
        label={t('slotCapacity', { n: n ?? share.slots.length + 1 })}
        value={row.capacity}
        error={errors[key]?.capacity}
        onChange={(v) => change(key, { capacity: v })}
      />
    </>
  );

  return (
    <ContentCard aria-labelledby="share-slots">
      <Heading level="section" id="share-slots">
        {t('slotsHeading')}
      </Heading>
      <p className={organiser.lead}>{t('slotsEditLead')}</p>
      {share.slots.map((s, i) => (
        <div key={s.id} className={styles.slot}>
          {rowFields(s.id, i + 1, rows[s.id] ?? rowOf(s))}
          <Button
            icon={<SaveRegular />}
            aria-label={t('saveSlot', { n: i + 1 })}
            disabled={editSlot.isPending}
            onClick={() => save(s)}
          />
          {/* Only an empty slot can go: one with reservations was promised to households (the API says 409). */}
          {s.booked === 0 ? (
            <Button
              icon={<DeleteRegular />}
              aria-label={t('deleteSlot', { n: i + 1 })}
              disabled={deleteSlot.isPending}
              onClick={() => setDeleting({ slot: s, n: i + 1 })}
            />
          ) : (
            <span className={styles.noButton} />
          )}
          <p className={styles.booked}>{t('slotLine', { booked: s.booked, count: s.capacity })}</p>
        </div>
      ))}
      {share.slots.length < MAX_SLOTS ? (
        <div className={styles.slot}>
          {rowFields('new', null, fresh)}
          <Button icon={<AddRegular />} disabled={addSlot.isPending} onClick={add}>
            {t('addSlot')}
          </Button>
          <span className={styles.noButton} />
        </div>
      ) : null}
      {note ? (
        <MessageBar intent={note.intent}>
          <MessageBarBody>{note.text}</MessageBarBody>
        </MessageBar>
      ) : null}
      {deleting ? (
        <Dialog open onOpenChange={(_, d) => !d.open && setDeleting(null)}>
          <DialogSurface>
            <DialogBody>
              <DialogTitle>
                {t('deleteSlotTitle', {
                  n: deleting.n,
                  when: `${clockOf(deleting.slot.start)}–${clockOf(deleting.slot.end)}`,
                })}
              </DialogTitle>
              <DialogContent>{t('deleteSlotText')}</DialogContent>
              <DialogActions>
                <Button onClick={() => setDeleting(null)}>{t('deleteSlotKeep')}</Button>
                <Button appearance="primary" onClick={() => remove(deleting.slot)}>
                  {t('deleteSlotConfirm')}
                </Button>
              </DialogActions>
            </DialogBody>
          </DialogSurface>
        </Dialog>
      ) : null}
    </ContentCard>
  );
}

function SlotField(props: {
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
