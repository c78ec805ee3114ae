import { Button, Field, makeStyles, SearchBox, Spinner, tokens } from '@fluentui/react-components';
import { Add16Regular, Checkmark16Regular } from '@fluentui/react-icons';
import { type SpeciesSummary, cautionList } from '@homeground/shared';
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
  const [text, setText] = useState('');
  const q = useDebouncedValue(text.trim(), 300);
  const search = useQuery({
    ...speciesListQueryOptions({ q, pageSize: 8, sort: 'relevance' }),
    enabled: q.length >= 2,
  });
  const items = q.length >= 2 ? (search.data?.items ?? []) : [];

  return (
    <div>
      <Field label="Search the catalogue" hint="Common or scientific name; small typos are fine.">
        <SearchBox value={text} onChange={(_, d) => setText(d.value)} placeholder="e.g. butterfly weed" />
      </Field>
      {search.isFetching && q.length >= 2 ? <Spinner className={styles.status} size="tiny" label="Searching" /> : null}
      {search.isError ? (
        <ErrorState
          title="The search did not answer."
          message={search.error.message}
          onRetry={() => void search.refetch()}
        />
      ) : null}
      {search.isSuccess && q.length >= 2 && items.length === 0 ? (
        <p className={styles.status} role="status">
          No species match “{q}”.
        </p>
      ) : null}
      {items.length > 0 ? (
        <ul className={styles.list} aria-label="Search results">
          {items.map((s) => {
            const added = chosen.includes(s.slug);
            return (
              <li key={s.slug} className={styles.item}>
                <span className={styles.names}>
                  {s.commonName} <span className={styles.scientific}>{s.scientificName}</span>
                  {s.cautionKinds.length > 0 ? (
                    <span className={styles.caution}>Cautions: {cautionList(s.cautionKinds)}</span>
                  ) : null}
                </span>
                <Button
                  size="small"
                  icon={added ? <Checkmark16Regular /> : <Add16Regular />}
                  disabled={added}
                  onClick={() => onAdd(s)}
                  aria-label={added ? `${s.commonName} is on your list` : `Add ${s.commonName}`}
                >
                  {added ? 'Added' : 'Add'}
                </Button>
              </li>
            );
          })}
        </ul>
      ) : null}
    </div>
  );
}
