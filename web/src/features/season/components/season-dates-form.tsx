import { Button, Field, Input, makeStyles, tokens } from '@fluentui/react-components';
import { type Season, seasonDatesFormSchema } from '@homeground/shared';
import { useState } from 'react';
import { useTranslation } from 'react-i18next';
import { useSaveSeasonMutation } from '../../../api/seasons/seasons.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';

const useStyles = makeStyles({
  form: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalL,
    alignItems: 'end',
    marginTop: tokens.spacingVerticalL,
  },
});

/**
 * Organisers move the season's dates: the average last spring frost (look up your place's own) and
 * the plant share. Every batch's dates follow, as they are worked out from these.
 */
export function SeasonDatesForm({ slug, season }: { slug: string; season: Season }) {
  const styles = useStyles();
  const { t } = useTranslation('season');
  const save = useSaveSeasonMutation(slug);
  const form = useSchemaForm({
    schema: seasonDatesFormSchema,
    initial: { year: String(season.year), lastFrost: season.lastFrost, plantShareDate: season.plantShareDate },
  });
  const [saved, setSaved] = useState(false);
  const submit = form.handleSubmit((body) => {
    setSaved(false);
    save.mutate(body, { onSuccess: () => setSaved(true), onError: (e) => form.fail(e) });
  });
  return (
    <form ref={form.formRef} onSubmit={submit} noValidate aria-label={t('dates.form')} className={styles.form}>
      {form.failure ? <p role="alert">{form.failure}</p> : null}
      <Field label={t('dates.lastFrost')} {...form.validation('lastFrost')}>
        <Input type="date" value={form.values.lastFrost} onChange={(_, d) => form.change('lastFrost', d.value)} />
      </Field>
      <Field label={t('dates.plantShare')} {...form.validation('plantShareDate')}>
        <Input
          type="date"
          value={form.values.plantShareDate}
          onChange={(_, d) => form.change('plantShareDate', d.value)}
        />
      </Field>
      <Button type="submit" disabled={save.isPending}>
        {save.isPending ? t('dates.saving') : t('dates.save')}
      </Button>
      <span aria-live="polite">{saved ? t('dates.saved') : ''}</span>
    </form>
  );
}
