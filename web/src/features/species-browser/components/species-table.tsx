import { useTranslation } from 'react-i18next';
import type { SpeciesSummary } from '@homeground/shared';
import { mergeClasses } from '@fluentui/react-components';
import { ArrowDown12Regular, ArrowUp12Regular } from '@fluentui/react-icons';
import { paths } from '../../../config/paths.js';
import type { OptionalColumn } from '../hooks/use-column-choice.js';
import type { NameHighlights } from '../hooks/use-name-highlights.js';
import type { SortOrder, SpeciesSort } from '../utils/browser-state.js';
import { NameCell, OptionalCell } from './species-cells.js';
import { useTableStyles } from './species-table.styles.js';

/** Columns the API can sort by, and the order a first click asks for (most wildlife value first). */
const SORTABLE: Partial<Record<OptionalColumn | 'commonName', { sort: SpeciesSort; first: SortOrder }>> = {
  commonName: { sort: 'name', first: 'asc' },
  scientificName: { sort: 'scientificName', first: 'asc' },
  height: { sort: 'height', first: 'asc' },
  bloom: { sort: 'bloomStart', first: 'asc' },
  hostValue: { sort: 'hostValue', first: 'desc' },
};

// Wildlife value is words, not a number, so no column is set as figures.
const NUMERIC: ReadonlySet<OptionalColumn> = new Set<OptionalColumn>();

export interface SpeciesTableProps {
  items: readonly SpeciesSummary[];
  columns: readonly OptionalColumn[];
  highlights: Map<string, NameHighlights>;
  /** The order the rows are in now (the API's default made explicit). */
  sort: SpeciesSort;
  order: SortOrder;
  onSort: (sort: SpeciesSort, order: SortOrder) => void;
  captionId: string;
}

function HeaderCell({
  column,
  label,
  sort,
  order,
  onSort,
  className,
}: {
  column: OptionalColumn | 'commonName';
  label: string;
  className?: string;
} & Pick<SpeciesTableProps, 'sort' | 'order' | 'onSort'>) {
  const styles = useTableStyles();
  const sortable = SORTABLE[column];
  if (!sortable) {
    return (
      <th scope="col" className={mergeClasses(styles.th, className)}>
        {label}
      </th>
    );
  }
  const isActive = sortable.sort === sort;
  const nextOrder: SortOrder = isActive ? (order === 'asc' ? 'desc' : 'asc') : sortable.first;
  return (
    <th
      scope="col"
      className={mergeClasses(styles.th, className)}
      aria-sort={isActive ? (order === 'asc' ? 'ascending' : 'descending') : 'none'}
    >
      <button type="button" className={styles.sortButton} onClick={() => onSort(sortable.sort, nextOrder)}>
        {label}
        {isActive ? order === 'asc' ? <ArrowUp12Regular aria-hidden /> : <ArrowDown12Regular aria-hidden /> : null}
      </button>
    </th>
  );
}

/** The catalogue as a table: one row per species, sortable headers, optional columns. */
export function SpeciesTable({ items, columns, highlights, sort, order, onSort, captionId }: SpeciesTableProps) {
  const styles = useTableStyles();
  const { t } = useTranslation('species');
  return (
    <>
      <p className={styles.scrollHint}>{t('results.scrollHint')}</p>
      {/* Its own name, not the section heading's: two regions with one name are one landmark twice. */}
      <div className={styles.scroller} role="region" aria-label={t('results.tableRegion')} tabIndex={0}>
        <table className={styles.table} aria-labelledby={captionId}>
          <thead>
            <tr>
              <HeaderCell
                column="commonName"
                label={t('columns.commonName')}
                className={styles.sticky}
                sort={sort}
                order={order}
                onSort={onSort}
              />
              {columns.map((c) => (
                <HeaderCell
                  key={c}
                  column={c}
                  label={t(`columns.${c}`)}
                  className={NUMERIC.has(c) ? styles.number : undefined}
                  sort={sort}
                  order={order}
                  onSort={onSort}
                />
              ))}
            </tr>
          </thead>
          <tbody>
            {items.map((s) => (
              <tr key={s.slug}>
                <th scope="row" className={mergeClasses(styles.td, styles.sticky, styles.rowHeader)}>
                  <NameCell species={s} href={paths.speciesDetail.build(s.slug)} highlights={highlights.get(s.slug)} />
                </th>
                {columns.map((c) => (
                  <td key={c} className={mergeClasses(styles.td, NUMERIC.has(c) && styles.number)}>
                    <OptionalCell column={c} species={s} highlights={highlights.get(s.slug)} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
