import { Button, Field, Input, Select, Textarea, ToggleButton } from '@fluentui/react-components';
import { LOG_KINDS, LOSS_REASONS, logEntryFormSchema, type Batch, type LogEntryRequest } from '@homeground/shared';
import { useRef, useState } from 'react';
import { useLogEntryMutation } from '../../../api/batches/batches.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import type { LogOutboxState } from '../offline/use-log-outbox.js';
import { useTranslation } from 'react-i18next';
import { useMyBatchesStyles } from './my-batches.styles.js';

/**
 * Adds one line to a batch log from a phone: pick what happened with a big button, type how many,
 * and save. The date starts at today. Checked with the shared schema before sending; the API's 400
 * (e.g. more came up than were sown) shows beside the field it names. The entry is kept on the
 * device first and then sent, so with no signal it waits, marked "not yet sent", until it can go.
 */
export function LogForm({
  slug,
  batch,
  today,
  outbox,
}: {
  slug: string;
  batch: Batch;
  today: string;
  outbox: LogOutboxState;
}) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const mutation = useLogEntryMutation(slug);
  const form = useSchemaForm({
    schema: logEntryFormSchema,
    initial: { kind: 'sown', count: '', date: today, reason: '', note: '' },
  });
  const [outcome, setOutcome] = useState<'saved' | 'kept' | null>(null);
  const [busy, setBusy] = useState(false);
  // One id per entry, kept across retries, so an entry sent twice is stored once.
  const clientId = useRef<string | null>(null);

  const done = (how: 'saved' | 'kept') => {
    clientId.current = null;
    form.change('count', '');
    form.change('note', '');
    setOutcome(how);
  };

  /** Without a device store (IndexedDB switched off) the entry is sent straight away, as before. */
  const sendDirectly = (entry: LogEntryRequest) =>
    mutation.mutate({ batchId: batch.id, entry }, { onSuccess: () => done('saved'), onError: (e) => form.fail(e) });

  const submit = form.handleSubmit((parsed) => {
    setOutcome(null);
    const id = (clientId.current ??= crypto.randomUUID());
    const entry = { ...parsed, clientId: id };
    setBusy(true);
    void (async () => {
      try {
        try {
          await outbox.keep({ clientId: id, batchId: batch.id, entry });
        } catch {
          sendDirectly(entry);
          return;
        }
        const result = await outbox.send();
        const refused = result.refused.find((r) => r.clientId === id);
        if (refused) {
          // Still in the form, so the grower fixes it here rather than in the not-yet-sent list.
          await outbox.remove(id);
          form.fail(refused.error);
          return;
        }
        done(result.sent.includes(id) ? 'saved' : 'kept');
      } catch (error) {
        form.fail(error);
      } finally {
        setBusy(false);
      }
    })();
  });
  const choose = (kind: string) => {
    form.change('kind', kind);
    if (kind !== 'lost') form.change('reason', '');
    clientId.current = null;
  };
  const label = t('log.recordFor', { name: batch.commonName });
  const kind = (LOG_KINDS as readonly string[]).includes(form.values.kind)
    ? (form.values.kind as (typeof LOG_KINDS)[number])
    : null;

  return (
    <form ref={form.formRef} onSubmit={submit} noValidate aria-label={label} className={styles.form}>
      {form.failure ? <p role="alert">{form.failure}</p> : null}
      <div role="group" aria-label={t('log.whatHappened')} className={styles.kinds}>
        {LOG_KINDS.map((k) => (
          <ToggleButton
            key={k}
            className={styles.big}
            checked={form.values.kind === k}
            aria-pressed={form.values.kind === k}
            onClick={() => choose(k)}
          >
            {t(`kinds.${k}`)}
          </ToggleButton>
        ))}
      </div>
      <Field
        className={styles.field}
        label={t('log.countLabel', { counts: kind ? t(`counts.${kind}`) : t('log.howMany') })}
        {...form.validation('count')}
      >
        <Input
          className={styles.big}
          inputMode="numeric"
          value={form.values.count}
          onChange={(_, d) => form.change('count', d.value)}
        />
      </Field>
      {form.values.kind === 'lost' ? (
        <Field className={styles.field} label={t('log.why')} {...form.validation('reason')}>
          <Select className={styles.big} value={form.values.reason} onChange={(_, d) => form.change('reason', d.value)}>
            <option value="">{t('log.chooseReason')}</option>
            {LOSS_REASONS.map((r) => (
              <option key={r} value={r}>
                {t(`reasons.${r}`)}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      <Field className={styles.field} label={t('log.date')} {...form.validation('date')}>
        <Input
          className={styles.big}
          type="date"
          max={today}
          value={form.values.date}
          onChange={(_, d) => form.change('date', d.value)}
        />
      </Field>
      <Field className={styles.field} label={t('log.noteOptional')} {...form.validation('note')}>
        <Textarea value={form.values.note} onChange={(_, d) => form.change('note', d.value)} />
      </Field>
      <div>
        <Button
          type="submit"
          appearance="primary"
          size="large"
          className={styles.big}
          disabled={busy || mutation.isPending}
        >
          {busy || mutation.isPending ? t('log.saving') : t('log.record')}
        </Button>
      </div>
      <p aria-live="polite">{outcome === 'saved' ? t('log.saved') : outcome === 'kept' ? t('offline.kept') : ''}</p>
    </form>
  );
}
