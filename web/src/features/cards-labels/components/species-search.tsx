import { useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { Button, Field, makeStyles, SearchBox, Spinner, tokens } from '@fluentui/react-components';
import { Add16Regular, Checkmark16Regular } from '@fluentui/react-icons';
import type { SpeciesSummary } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { speciesListQueryOptions } from '../../../api/species/species.queries.js';
import { ErrorState } from '../../../components/states/index.js';
import { useDebouncedValue } from '../hooks/use-debounced-value.js';

const useStyles = makeStyles({
  list: { listStyle: 'none', margin: `${tokens.spacingVerticalS} 0 0`, padding: 0 },
  item: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    padding: `${tokens.spacingVerticalS} 0`,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  names: { flexGrow: 1, minWidth: 0 },
  scientific: { fontStyle: 'italic', color: tokens.colorNeutralForeground2 },
  caution: { display: 'block', fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
  status: { margin: `${tokens.spacingVerticalS} 0 0`, color: tokens.colorNeutralForeground2 },
});

/** Searches the catalogue (typo-tolerant) and adds a result to the chosen list. */
export function SpeciesSearch({
  chosen,
  onAdd,
}: {
  chosen: readonly string[];
  onAdd: (species: SpeciesSummary) => void;
}) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const words = useWords();
  const [text, setText] = useState('');
  const q = useDebouncedValue(text.trim(), 300);
  const search = useQuery({
    ...speciesListQueryOptions({ q, pageSize: 8, sort: 'relevance' }),
    enabled: q.length >= 2,
  });
  const items = q.length >= 2 ? (search.data?.items ?? []) : [];

  return (
    <div>
      <Field label={t('choose.searchLabel')} hint={t('choose.searchHint')}>
        <SearchBox value={text} onChange={(_, d) => setText(d.value)} placeholder={t('choose.searchPlaceholder')} />
      </Field>
      {search.isFetching && q.length >= 2 ? (
        <Spinner className={styles.status} size="tiny" label={t('choose.searching')} />
      ) : null}
      {search.isError ? (
        <ErrorState
          title={t('choose.searchError')}
          message={search.error.message}
          onRetry={() => void search.refetch()}
        />
      ) : null}
      {search.isSuccess && q.length >= 2 && items.length === 0 ? (
        <p className={styles.status} role="status">
          {t('choose.noMatch', { query: q })}
        </p>
      ) : null}
      {items.length > 0 ? (
        <ul className={styles.list} aria-label={t('choose.results')}>
          {items.map((s) => {
            const added = chosen.includes(s.slug);
            return (
              <li key={s.slug} className={styles.item}>
                <span className={styles.names}>
                  {s.commonName} <span className={styles.scientific}>{s.scientificName}</span>
                  {s.cautionKinds.length > 0 ? (
                    <span className={styles.caution}>
                      {t('choose.cautions', { list: words.cautionList(s.cautionKinds) })}
                    </span>
                  ) : null}
                </span>
                <Button
                  size="small"
                  icon={added ? <Checkmark16Regular /> : <Add16Regular />}
                  disabled={added}
                  onClick={() => onAdd(s)}
                  aria-label={
                    added ? t('choose.isAdded', { name: s.commonName }) : t('choose.addName', { name: s.commonName })
                  }
                >
                  {added ? t('choose.added') : t('choose.add')}
                </Button>
              </li>
            );
          })}
        </ul>
      ) : null}
    </div>
  );
}
