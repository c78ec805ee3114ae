import { Button, Field, Input } from '@fluentui/react-components';
import { GROWER_METHODS, growerSetupFormSchema, UNIT_OF, type SeasonGrower } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useSaveGrowerMutation } from '../../../api/batches/batches.mutations.js';
import { myGrowersQueryOptions } from '../../../api/batches/batches.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { useTranslation } from 'react-i18next';
import { useFormatters, useWords } from '../../../lib/i18n/index.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/** Where the grower says how they grow and how many pots, containers or blocks they can tend. */
export function GrowerSetupCard({ slug, userId }: { slug: string; userId: string }) {
  const { t } = useTranslation('batches');
  const { moment } = useFormatters();
  const growers = useQuery(myGrowersQueryOptions(slug, userId));
  return (
    <ContentCard aria-labelledby="how-i-grow">
      <Heading level="section" id="how-i-grow">
        {t('setup.title')}
      </Heading>
      <p>{t('setup.lead')}</p>
      <QueryState query={growers} loading={t('page.loading')} error={t('page.failed')}>
        {({ data: list, savedAt }) => (
          <>
            {savedAt ? <p>{t('setup.savedCopy', { when: moment(savedAt) })}</p> : null}
            <GrowerSetupForm slug={slug} userId={userId} me={list.find((g) => g.userId === userId)} />
          </>
        )}
      </QueryState>
    </ContentCard>
  );
}

function GrowerSetupForm({ slug, userId, me }: { slug: string; userId: string; me: SeasonGrower | undefined }) {
  const styles = useMyBatchesStyles();
  const { t } = useTranslation('batches');
  const words = useWords();
  const save = useSaveGrowerMutation(slug);
  const stated = (m: (typeof GROWER_METHODS)[number]) =>
    String(me?.methods.find((x) => x.method === m)?.capacity ?? '');
  const form = useSchemaForm({
    schema: growerSetupFormSchema,
    initial: {
      'outdoor-pot-winter': stated('outdoor-pot-winter'),
      'winter-sowing': stated('winter-sowing'),
      'indoor-lights': stated('indoor-lights'),
      'soil-blocks': stated('soil-blocks'),
    },
  });
  const [saved, setSaved] = useState(false);
  const submit = form.handleSubmit((body) => {
    setSaved(false);
    save.mutate({ userId, body }, { onSuccess: () => setSaved(true), onError: (e) => form.fail(e) });
  });
  return (
    <form ref={form.formRef} onSubmit={submit} noValidate aria-label={t('setup.title')} className={styles.form}>
      {form.failure ? <p role="alert">{form.failure}</p> : null}
      {GROWER_METHODS.map((m) => (
        <Field
          key={m}
          className={styles.field}
          label={t('setup.field', {
            method: words.sowingMethod[m].phrase,
            units: t(`units.${UNIT_OF[m]}`, { count: 2 }),
          })}
          {...form.validation(m)}
        >
          <Input
            className={styles.big}
            inputMode="numeric"
            placeholder={t('setup.notUsed')}
            value={form.values[m]}
            onChange={(_, d) => form.change(m, d.value)}
          />
        </Field>
      ))}
      <div>
        <Button type="submit" appearance="primary" size="large" className={styles.big} disabled={save.isPending}>
          {save.isPending ? t('log.saving') : t('setup.save')}
        </Button>
      </div>
      <p aria-live="polite">{saved ? t('setup.saved') : ''}</p>
    </form>
  );
}
