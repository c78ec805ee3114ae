import { Label, makeStyles, Select, tokens } from '@fluentui/react-components';
import { useId } from 'react';
import type { SortOrder, SpeciesSort } from '../utils/browser-state.js';

// Label beside the control without Field's horizontal grid, which gives the label a third of the width.
const useStyles = makeStyles({
  inline: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  select: { minWidth: '13em' },
});

const CHOICES: { sort: SpeciesSort; order: SortOrder; label: string }[] = [
  { sort: 'relevance', order: 'asc', label: 'Best match' },
  { sort: 'name', order: 'asc', label: 'Common name, A to Z' },
  { sort: 'name', order: 'desc', label: 'Common name, Z to A' },
  { sort: 'scientificName', order: 'asc', label: 'Scientific name, A to Z' },
  { sort: 'scientificName', order: 'desc', label: 'Scientific name, Z to A' },
  { sort: 'height', order: 'asc', label: 'Shortest first' },
  { sort: 'height', order: 'desc', label: 'Tallest first' },
  { sort: 'bloomStart', order: 'asc', label: 'Earliest bloom first' },
  { sort: 'bloomStart', order: 'desc', label: 'Latest bloom first' },
  { sort: 'hostValue', order: 'desc', label: 'Most wildlife value first' },
  { sort: 'hostValue', order: 'asc', label: 'Least wildlife value first' },
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
  const id = useId();
  const choices = CHOICES.filter((c) => isSearching || c.sort !== 'relevance');
  const value = `${sort}:${sort === 'relevance' ? 'asc' : order}`;
  return (
    <div className={styles.inline}>
      <Label htmlFor={id}>Sort by</Label>
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
            {c.label}
          </option>
        ))}
      </Select>
    </div>
  );
}
