import { Button, makeStyles, Spinner, tokens } from '@fluentui/react-components';
import { ArrowClockwise16Regular, Dismiss16Regular } from '@fluentui/react-icons';
import { countOf } from '@homeground/shared';
import { useId } from 'react';
import { EmptyState } from '../../../components/states/index.js';
import type { ChosenEntry } from '../hooks/use-chosen-species.js';

const useStyles = makeStyles({
  head: {
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    flexWrap: 'wrap',
  },
  count: { margin: 0, fontWeight: tokens.fontWeightSemibold, fontSize: tokens.fontSizeBase400 },
  list: {
    listStyle: 'none',
    margin: `${tokens.spacingVerticalS} 0 0`,
    padding: 0,
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(260px, 1fr))',
    gap: `0 ${tokens.spacingHorizontalL}`,
  },
  item: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    padding: `${tokens.spacingVerticalXS} 0`,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  name: { flexGrow: 1, minWidth: 0 },
  scientific: { fontStyle: 'italic', color: tokens.colorNeutralForeground2 },
  problem: { color: tokens.colorStatusDangerForeground1 },
});

/** The species on the list, with a count and a remove button each. */
export function ChosenSpeciesList({
  entries,
  onRemove,
  onClear,
}: {
  entries: readonly ChosenEntry[];
  onRemove: (slug: string) => void;
  onClear: () => void;
}) {
  const styles = useStyles();
  const countId = useId();
  if (entries.length === 0) {
    return (
      <EmptyState title="No species chosen yet">
        Add plants by searching or pasting a list; each gets a fact card and a pot label.
      </EmptyState>
    );
  }
  return (
    <div>
      <div className={styles.head}>
        <p id={countId} className={styles.count} aria-live="polite">
          {countOf(entries.length, 'species', 'species')} chosen
        </p>
        <Button appearance="subtle" onClick={onClear}>
          Remove all
        </Button>
      </div>
      <ul className={styles.list} aria-labelledby={countId}>
        {entries.map((entry) => {
          const name = entry.status === 'ready' ? entry.species.commonNames[0] : entry.slug;
          return (
            <li key={entry.slug} className={styles.item}>
              <span className={styles.name}>
                {entry.status === 'ready' ? (
                  <>
                    {name} <span className={styles.scientific}>{entry.species.scientificName}</span>
                  </>
                ) : entry.status === 'loading' ? (
                  <Spinner size="extra-tiny" label={`Getting ${entry.slug}`} labelPosition="after" />
                ) : entry.status === 'missing' ? (
                  <span className={styles.problem}>“{entry.slug}” is not in the catalogue, so it has no card.</span>
                ) : (
                  <span className={styles.problem}>
                    “{entry.slug}” did not load: {entry.message}
                  </span>
                )}
              </span>
              {entry.status === 'error' ? (
                <Button
                  size="small"
                  appearance="subtle"
                  icon={<ArrowClockwise16Regular />}
                  onClick={entry.retry}
                  aria-label={`Try ${entry.slug} again`}
                />
              ) : null}
              <Button
                size="small"
                appearance="subtle"
                icon={<Dismiss16Regular />}
                onClick={() => onRemove(entry.slug)}
                aria-label={`Remove ${name}`}
              />
            </li>
          );
        })}
      </ul>
    </div>
  );
}
