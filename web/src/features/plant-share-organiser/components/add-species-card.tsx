import {
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Radio,
  RadioGroup,
  SearchBox,
} from '@fluentui/react-components';
import { AddRegular } from '@fluentui/react-icons';
import { addStockRequestSchema, type PlantShare } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useDeferredValue, useState } from 'react';
import { useAddStockMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { speciesListQueryOptions } from '../../../api/species/species.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { asSentence } from '../../../lib/forms/field-errors.js';
import { useTranslation } from 'react-i18next';
import { useOrganiserStyles } from './organiser.styles.js';

/**
 * Puts a species that is not on offer yet on the list: found in the catalogue by name, with the
 * plants that got ready. Households waiting for it (none yet, usually) are offered them first.
 */
export function AddSpeciesCard({ share }: { share: PlantShare }) {
  const { t } = useTranslation('organiser');
  const styles = useOrganiserStyles();
  const addStock = useAddStockMutation(share.groupSlug);
  const [text, setText] = useState('');
  const q = useDeferredValue(text.trim());
  const [slug, setSlug] = useState('');
  const [count, setCount] = useState('');
  const [countError, setCountError] = useState<string | undefined>();
  const [note, setNote] = useState<{ intent: 'success' | 'error'; text: string } | null>(null);
  const search = useQuery({
    ...speciesListQueryOptions({ q, pageSize: 8, sort: 'relevance' }),
    enabled: q.length >= 2,
  });
  const onOffer = new Set(share.stock.map((s) => s.speciesSlug));
  const items = q.length >= 2 ? (search.data?.items ?? []).filter((s) => !onOffer.has(s.slug)) : [];

  const submit = () => {
    setNote(null);
    if (!slug) return setNote({ intent: 'error', text: t('addSpeciesPick') });
    const parsed = addStockRequestSchema.safeParse({
      lines: [{ speciesSlug: slug, count: count.trim() === '' ? Number.NaN : Number(count) }],
    });
    if (!parsed.success) {
      const issue = parsed.error.issues.find((i) => i.path.at(-1) === 'count') ?? parsed.error.issues[0];
      return setCountError(asSentence(issue.message));
    }
    setCountError(undefined);
    addStock.mutate(parsed.data, {
      onSuccess: () => {
        setSlug('');
        setCount('');
        setText('');
        setNote({ intent: 'success', text: t('stockAdded') });
      },
      onError: (e) => setNote({ intent: 'error', text: e.message }),
    });
  };

  return (
    <ContentCard aria-labelledby="add-species">
      <Heading level="section" id="add-species">
        {t('addSpeciesHeading')}
      </Heading>
      <p className={styles.lead}>{t('addSpeciesLead')}</p>
      <Field label={t('addSpeciesSlug')}>
        <SearchBox value={text} onChange={(_, d) => setText(d.value)} />
      </Field>
      {items.length > 0 ? (
        <RadioGroup value={slug} onChange={(_, d) => setSlug(d.value)} aria-label={t('addSpeciesSlug')}>
          {items.map((s) => (
            <Radio key={s.slug} value={s.slug} label={`${s.commonName} (${s.scientificName})`} />
          ))}
        </RadioGroup>
      ) : null}
      <Field
        label={t('addSpeciesCount')}
        validationMessage={countError}
        validationState={countError ? 'error' : 'none'}
      >
        <Input className={styles.number} inputMode="numeric" value={count} onChange={(_, d) => setCount(d.value)} />
      </Field>
      {note ? (
        <MessageBar intent={note.intent}>
          <MessageBarBody>{note.text}</MessageBarBody>
        </MessageBar>
      ) : null}
      <div className={styles.actions}>
        <Button icon={<AddRegular />} onClick={submit} disabled={addStock.isPending}>
          {t('addSpeciesSubmit')}
        </Button>
      </div>
    </ContentCard>
  );
}
