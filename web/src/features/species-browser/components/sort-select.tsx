import type { species } from '../../../locales/en/species.js';
import { useTranslation } from 'react-i18next';
import { Label, makeStyles, Select, tokens } from '@fluentui/react-components';
import { useId } from 'react';
import type { SortOrder, SpeciesSort } from '../utils/browser-state.js';

// Label beside the control without Field's horizontal grid, which gives the label a third of the width.
const useStyles = makeStyles({
  // Wraps under its label on a phone: some orders are long in Spanish.
  inline: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalS, maxWidth: '100%' },
  select: { minWidth: '13em', maxWidth: '100%' },
});

type SortLabel = Exclude<keyof (typeof species)['sort'], 'label'>;

const CHOICES: { sort: SpeciesSort; order: SortOrder; label: SortLabel }[] = [
  { sort: 'relevance', order: 'asc', label: 'relevance' },
  { sort: 'name', order: 'asc', label: 'nameAsc' },
  { sort: 'name', order: 'desc', label: 'nameDesc' },
  { sort: 'scientificName', order: 'asc', label: 'scientificAsc' },
  { sort: 'scientificName', order: 'desc', label: 'scientificDesc' },
  { sort: 'height', order: 'asc', label: 'heightAsc' },
  { sort: 'height', order: 'desc', label: 'heightDesc' },
  { sort: 'bloomStart', order: 'asc', label: 'bloomAsc' },
  { sort: 'bloomStart', order: 'desc', label: 'bloomDesc' },
  { sort: 'hostValue', order: 'desc', label: 'hostDesc' },
  { sort: 'hostValue', order: 'asc', label: 'hostAsc' },
];

/** The same orders as the column headers, as one control that also suits a phone. */
export function SortSelect({
  sort,
  order,
  isSearching,
  onSort,
}: {
  sort: SpeciesSort;
  order: SortOrder;
  isSearching: boolean;
  onSort: (sort: SpeciesSort, order: SortOrder) => void;
}) {
  // "Best match" only means something while searching; without a search the API falls back to names.
  const styles = useStyles();
  const { t } = useTranslation('species');
  const id = useId();
  const choices = CHOICES.filter((c) => isSearching || c.sort !== 'relevance');
  const value = `${sort}:${sort === 'relevance' ? 'asc' : order}`;
  return (
    <div className={styles.inline}>
      <Label htmlFor={id}>{t('sort.label')}</Label>
      <Select
        id={id}
        className={styles.select}
        value={value}
        onChange={(_, d) => {
          const [s, o] = d.value.split(':') as [SpeciesSort, SortOrder];
          onSort(s, o);
        }}
      >
        {choices.map((c) => (
          <option key={`${c.sort}:${c.order}`} value={`${c.sort}:${c.order}`}>
            {t(`sort.${c.label}`)}
          </option>
        ))}
      </Select>
    </div>
  );
}
