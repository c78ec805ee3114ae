import { Button, Field, Input, MessageBar, MessageBarBody, Textarea } from '@fluentui/react-components';
import { MailRegular, WeatherSnowflakeRegular } from '@fluentui/react-icons';
import { frostWarningRequestSchema, type FrostWarningAnswer, type WeeklySummaryAnswer } from '@homeground/shared';
import { useState } from 'react';
import { useFrostWarningMutation, useWeeklySummaryMutation } from '../../../api/batches/batches.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { frostSentWords, SEASON_BATCHES_WORDS as W, weeklySentWords } from '../utils/season-batches-words.js';
import { useSeasonBatchesStyles } from './season-batches.styles.js';

/** Today and tomorrow on the organiser's own calendar, as YYYY-MM-DD. */
function localDay(offsetDays: number, now = new Date()): string {
  const d = new Date(now.getFullYear(), now.getMonth(), now.getDate() + offsetDays);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/**
 * E-mail to the growers: a frost warning for a night (only growers with plants outdoors get it, each
 * told what to close, cover or bring in), and this week's summary sent now rather than by the weekly job.
 */
export function GrowerMailCard({ slug }: { slug: string }) {
  const styles = useSeasonBatchesStyles();
  const frost = useFrostWarningMutation(slug);
  const weekly = useWeeklySummaryMutation(slug);
  const form = useSchemaForm({ schema: frostWarningRequestSchema, initial: { night: localDay(0), note: '' } });
  const [frostSent, setFrostSent] = useState<FrostWarningAnswer | null>(null);
  const [weeklySent, setWeeklySent] = useState<WeeklySummaryAnswer | null>(null);

  const submit = form.handleSubmit((body) => {
    setFrostSent(null);
    frost.mutate(body, { onSuccess: setFrostSent, onError: (e) => form.fail(e) });
  });

  return (
    <ContentCard aria-labelledby="grower-mail">
      <Heading level="section" id="grower-mail">
        {W.mail}
      </Heading>
      <p className={styles.lead}>{W.frostLead}</p>
      <form ref={form.formRef} onSubmit={submit} noValidate aria-label={W.frostForm} className={styles.mailForm}>
        {form.failure ? <p role="alert">{form.failure}</p> : null}
        <Field label={W.frostNight} {...form.validation('night')}>
          <Input
            type="date"
            min={localDay(0)}
            value={form.values.night}
            onChange={(_, d) => form.change('night', d.value)}
          />
        </Field>
        <Field label={W.frostNote} hint={W.frostNoteHint} {...form.validation('note')}>
          <Textarea value={form.values.note ?? ''} onChange={(_, d) => form.change('note', d.value)} />
        </Field>
        <div>
          <Button type="submit" icon={<WeatherSnowflakeRegular />} disabled={frost.isPending}>
            {frost.isPending ? W.sending : W.sendFrost}
          </Button>
        </div>
      </form>
      {frostSent ? (
        <MessageBar intent={frostSent.growers.length ? 'success' : 'info'}>
          <MessageBarBody>{frostSentWords(frostSent)}</MessageBarBody>
        </MessageBar>
      ) : null}

      <Heading level="card">{W.weekly}</Heading>
      <p className={styles.lead}>{W.weeklyLead}</p>
      <Button
        icon={<MailRegular />}
        disabled={weekly.isPending}
        onClick={() => weekly.mutate(undefined, { onSuccess: setWeeklySent })}
      >
        {weekly.isPending ? W.sending : W.sendWeekly}
      </Button>
      {weekly.isError ? <p role="alert">{W.weeklyFailed}</p> : null}
      {weeklySent ? (
        <MessageBar intent="success">
          <MessageBarBody>{weeklySentWords(weeklySent)}</MessageBarBody>
        </MessageBar>
      ) : null}
    </ContentCard>
  );
}
