import { useTranslation } from 'react-i18next';
import { Button, makeStyles, Spinner, tokens } from '@fluentui/react-components';
import { ArrowClockwise16Regular, Dismiss16Regular } from '@fluentui/react-icons';
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
  const { t } = useTranslation('cards');
  const countId = useId();
  if (entries.length === 0) {
    return <EmptyState title={t('choose.noneTitle')}>{t('choose.noneText')}</EmptyState>;
  }
  return (
    <div>
      <div className={styles.head}>
        <p id={countId} className={styles.count} aria-live="polite">
          {t('choose.chosen', { count: entries.length })}
        </p>
        <Button appearance="subtle" onClick={onClear}>
          {t('choose.removeAll')}
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
                  <Spinner size="extra-tiny" label={t('choose.getting', { slug: entry.slug })} labelPosition="after" />
                ) : entry.status === 'missing' ? (
                  <span className={styles.problem}>{t('choose.missing', { slug: entry.slug })}</span>
                ) : (
                  <span className={styles.problem}>
                    {t('choose.failed', { slug: entry.slug, message: entry.message })}
                  </span>
                )}
              </span>
              {entry.status === 'error' ? (
                <Button
                  size="small"
                  appearance="subtle"
                  icon={<ArrowClockwise16Regular />}
                  onClick={entry.retry}
                  aria-label={t('choose.retry', { slug: entry.slug })}
                />
              ) : null}
              <Button
                size="small"
                appearance="subtle"
                icon={<Dismiss16Regular />}
                onClick={() => onRemove(entry.slug)}
                aria-label={t('choose.remove', { name })}
              />
            </li>
          );
        })}
      </ul>
    </div>
  );
}
