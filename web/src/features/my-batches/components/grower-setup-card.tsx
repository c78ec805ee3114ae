import { Button, Field, Input } from '@fluentui/react-components';
import {
  GROWER_METHODS,
  growerSetupFormSchema,
  SOWING_METHOD_WORDS,
  UNIT_OF,
  UNIT_WORDS,
  type SeasonGrower,
} from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useSaveGrowerMutation } from '../../../api/batches/batches.mutations.js';
import { growersQueryOptions } from '../../../api/batches/batches.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { MY_BATCHES_WORDS } from '../utils/my-batches-words.js';
import { useMyBatchesStyles } from './my-batches.styles.js';

/** Where the grower says how they grow and how many pots, containers or blocks they can tend. */
export function GrowerSetupCard({ slug, userId }: { slug: string; userId: string }) {
  const growers = useQuery(growersQueryOptions(slug));
  return (
    <ContentCard aria-labelledby="how-i-grow">
      <Heading level="section" id="how-i-grow">
        {MY_BATCHES_WORDS.howIGrow}
      </Heading>
      <p>{MY_BATCHES_WORDS.howIGrowLead}</p>
      <QueryState query={growers} loading={MY_BATCHES_WORDS.loading} error={MY_BATCHES_WORDS.failed}>
        {(list) => <GrowerSetupForm slug={slug} userId={userId} me={list.find((g) => g.userId === userId)} />}
      </QueryState>
    </ContentCard>
  );
}

function GrowerSetupForm({ slug, userId, me }: { slug: string; userId: string; me: SeasonGrower | undefined }) {
  const styles = useMyBatchesStyles();
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
    <form
      ref={form.formRef}
      onSubmit={submit}
      noValidate
      aria-label={MY_BATCHES_WORDS.howIGrow}
      className={styles.form}
    >
      {form.failure ? <p role="alert">{form.failure}</p> : null}
      {GROWER_METHODS.map((m) => (
        <Field
          key={m}
          className={styles.field}
          label={`${SOWING_METHOD_WORDS[m].phrase}: ${UNIT_WORDS[UNIT_OF[m]].many}`}
          {...form.validation(m)}
        >
          <Input
            className={styles.big}
            inputMode="numeric"
            placeholder="not used"
            value={form.values[m]}
            onChange={(_, d) => form.change(m, d.value)}
          />
        </Field>
      ))}
      <div>
        <Button type="submit" appearance="primary" size="large" className={styles.big} disabled={save.isPending}>
          {save.isPending ? MY_BATCHES_WORDS.saving : MY_BATCHES_WORDS.saveHowIGrow}
        </Button>
      </div>
      <p aria-live="polite">{saved ? MY_BATCHES_WORDS.savedHowIGrow : ''}</p>
    </form>
  );
}
