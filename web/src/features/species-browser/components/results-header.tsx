import { useTranslation } from 'react-i18next';
import { Button, makeStyles, mergeClasses, Spinner } from '@fluentui/react-components';
import { ArrowDownload20Regular } from '@fluentui/react-icons';
import { forwardRef } from 'react';
import { SPECIES_EXPORT_URL } from '../../../api/species/species.api.js';
import { useHeadingStyles } from '../../../theme/index.js';
import type { OptionalColumn } from '../hooks/use-column-choice.js';
import type { SortOrder, SpeciesSort } from '../utils/browser-state.js';
import { ColumnMenu } from './column-menu.js';
import { useBrowserStyles } from './species-browser.styles.js';
import { SortSelect } from './sort-select.js';

const useStyles = makeStyles({ exportLink: { textDecorationLine: 'none' } });

export interface ResultsHeaderProps {
  headingId: string;
  total: number | undefined;
  first: number;
  last: number;
  query: string;
  isUpdating: boolean;
  sort: SpeciesSort;
  order: SortOrder;
  onSort: (sort: SpeciesSort, order: SortOrder) => void;
  columns: readonly OptionalColumn[];
  onColumns: (shown: OptionalColumn[]) => void;
}

/** The result count (announced politely as it changes) and the tools that shape the table. */
export const ResultsHeader = forwardRef<HTMLHeadingElement, ResultsHeaderProps>(
  function ResultsHeader(props, headingRef) {
    const styles = useBrowserStyles();
    const own = useStyles();
    const heading = useHeadingStyles();
    const { total, query } = props;
    const { t } = useTranslation('species');
    let title: string = t('results.title');
    if (total !== undefined)
      title = query ? t('results.matches', { count: total, query }) : t('results.count', { count: total });
    return (
      <div className={styles.toolbar}>
        <div aria-live="polite" className={styles.count}>
          <h2
            id={props.headingId}
            ref={headingRef}
            tabIndex={-1}
            className={mergeClasses(heading.base, heading.section, styles.heading)}
          >
            {title}
          </h2>
          {total ? (
            <p className={styles.range}>{t('results.showing', { first: props.first, last: props.last })}</p>
          ) : null}
        </div>
        <div className={styles.tools}>
          {props.isUpdating ? <Spinner size="tiny" label={t('results.updating')} className={styles.updating} /> : null}
          <SortSelect sort={props.sort} order={props.order} isSearching={query !== ''} onSort={props.onSort} />
          <ColumnMenu shown={props.columns} onChange={props.onColumns} />
          <Button
            as="a"
            href={SPECIES_EXPORT_URL}
            download
            icon={<ArrowDownload20Regular />}
            className={own.exportLink}
          >
            {t('results.exportAll')}
          </Button>
        </div>
      </div>
    );
  },
);
