import { Button, Field, Input, Select, Textarea, ToggleButton } from '@fluentui/react-components';
import {
  LOG_KINDS,
  LOG_KIND_WORDS,
  LOSS_REASONS,
  LOSS_REASON_WORDS,
  logEntryFormSchema,
  type Batch,
} from '@homeground/shared';
import { useRef, useState } from 'react';
import { useLogEntryMutation } from '../../../api/batches/batches.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { MY_BATCHES_WORDS } from '../utils/my-batches-words.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/**
 * Adds one line to a batch log from a phone: pick what happened with a big button, type how many,
 * and save. The date starts at today. Checked with the shared schema before sending; the API's 400
 * (e.g. more came up than were sown) shows beside the field it names.
 */
export function LogForm({ slug, batch, today }: { slug: string; batch: Batch; today: string }) {
  const styles = useMyBatchesStyles();
  const mutation = useLogEntryMutation(slug);
  const form = useSchemaForm({
    schema: logEntryFormSchema,
    initial: { kind: 'sown', count: '', date: today, reason: '', note: '' },
  });
  const [saved, setSaved] = useState(false);
  // One id per entry, kept across retries, so an entry sent twice is stored once.
  const clientId = useRef<string | null>(null);

  const submit = form.handleSubmit((entry) => {
    setSaved(false);
    clientId.current ??= crypto.randomUUID();
    mutation.mutate(
      { batchId: batch.id, entry: { ...entry, clientId: clientId.current } },
      {
        onSuccess: () => {
          clientId.current = null;
          form.change('count', '');
          form.change('note', '');
          setSaved(true);
        },
        onError: (error) => form.fail(error),
      },
    );
  });
  const choose = (kind: string) => {
    form.change('kind', kind);
    if (kind !== 'lost') form.change('reason', '');
    clientId.current = null;
  };
  const label = `${MY_BATCHES_WORDS.record}: ${batch.commonName}`;

  return (
    <form ref={form.formRef} onSubmit={submit} noValidate aria-label={label} className={styles.form}>
      {form.failure ? <p role="alert">{form.failure}</p> : null}
      <div role="group" aria-label="What happened" className={styles.kinds}>
        {LOG_KINDS.map((k) => (
          <ToggleButton
            key={k}
            className={styles.big}
            checked={form.values.kind === k}
            aria-pressed={form.values.kind === k}
            onClick={() => choose(k)}
          >
            {LOG_KIND_WORDS[k].label}
          </ToggleButton>
        ))}
      </div>
      <Field
        className={styles.field}
        label={`How many (${LOG_KIND_WORDS[form.values.kind as keyof typeof LOG_KIND_WORDS]?.counts ?? 'count'})`}
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
        <Field className={styles.field} label="Why were they lost?" {...form.validation('reason')}>
          <Select className={styles.big} value={form.values.reason} onChange={(_, d) => form.change('reason', d.value)}>
            <option value="">Choose a reason</option>
            {LOSS_REASONS.map((r) => (
              <option key={r} value={r}>
                {LOSS_REASON_WORDS[r]}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      <Field className={styles.field} label="Date" {...form.validation('date')}>
        <Input
          className={styles.big}
          type="date"
          max={today}
          value={form.values.date}
          onChange={(_, d) => form.change('date', d.value)}
        />
      </Field>
      <Field className={styles.field} label="Note (optional)" {...form.validation('note')}>
        <Textarea value={form.values.note} onChange={(_, d) => form.change('note', d.value)} />
      </Field>
      <div>
        <Button type="submit" appearance="primary" size="large" className={styles.big} disabled={mutation.isPending}>
          {mutation.isPending ? MY_BATCHES_WORDS.saving : MY_BATCHES_WORDS.record}
        </Button>
      </div>
      <p aria-live="polite">{saved ? MY_BATCHES_WORDS.saved : ''}</p>
    </form>
  );
}
