import { Button, Field, Input, MessageBar, MessageBarBody, Textarea } from '@fluentui/react-components';
import { MailRegular, WeatherSnowflakeRegular } from '@fluentui/react-icons';
import { frostWarningRequestSchema, type FrostWarningAnswer, type WeeklySummaryAnswer } from '@homeground/shared';
import { useState } from 'react';
import { useFrostWarningMutation, useWeeklySummaryMutation } from '../../../api/batches/batches.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';
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
  const { t } = useTranslation('seasonBatches');
  const words = useWords();
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
        {t('mail.title')}
      </Heading>
      <p className={styles.lead}>{t('mail.frostLead')}</p>
      <form
        ref={form.formRef}
        onSubmit={submit}
        noValidate
        aria-label={t('mail.frostForm')}
        className={styles.mailForm}
      >
        {form.failure ? <p role="alert">{form.failure}</p> : null}
        <Field label={t('mail.frostNight')} {...form.validation('night')}>
          <Input
            type="date"
            min={localDay(0)}
            value={form.values.night}
            onChange={(_, d) => form.change('night', d.value)}
          />
        </Field>
        <Field label={t('mail.frostNote')} hint={t('mail.frostNoteHint')} {...form.validation('note')}>
          <Textarea value={form.values.note ?? ''} onChange={(_, d) => form.change('note', d.value)} />
        </Field>
        <div>
          <Button type="submit" icon={<WeatherSnowflakeRegular />} disabled={frost.isPending}>
            {frost.isPending ? t('mail.sending') : t('mail.sendFrost')}
          </Button>
        </div>
      </form>
      {frostSent ? (
        <MessageBar intent={frostSent.growers.length ? 'success' : 'info'}>
          <MessageBarBody>
            {frostSent.growers.length === 0
              ? t('mail.frostNobody')
              : t('mail.frostSentTo', {
                  names: words.join(
                    frostSent.growers.map((g) => t('mail.growerBatches', { name: g.displayName, count: g.batches })),
                  ),
                })}
          </MessageBarBody>
        </MessageBar>
      ) : null}

      <Heading level="card">{t('mail.weekly')}</Heading>
      <p className={styles.lead}>{t('mail.weeklyLead')}</p>
      <Button
        icon={<MailRegular />}
        disabled={weekly.isPending}
        onClick={() => weekly.mutate(undefined, { onSuccess: setWeeklySent })}
      >
        {weekly.isPending ? t('mail.sending') : t('mail.sendWeekly')}
      </Button>
      {weekly.isError ? <p role="alert">{t('mail.weeklyFailed')}</p> : null}
      {weeklySent ? (
        <MessageBar intent="success">
          <MessageBarBody>
            {t('mail.weeklySent', { count: weeklySent.sent })}
            {weeklySent.alreadySent > 0 ? ` ${t('mail.weeklyAlready', { count: weeklySent.alreadySent })}` : ''}
          </MessageBarBody>
        </MessageBar>
      ) : null}
    </ContentCard>
  );
}
