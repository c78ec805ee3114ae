import { useTranslation } from 'react-i18next';
import type { SpeciesSummary } from '@homeground/shared';
import { Button, mergeClasses, Skeleton, SkeletonItem } from '@fluentui/react-components';
import { Filter20Regular } from '@fluentui/react-icons';
import { useQuery } from '@tanstack/react-query';
import { useId, useMemo, useRef, useState } from 'react';
import { speciesListQueryOptions } from '../../../api/species/species.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { EmptyState, ErrorState, QueryState } from '../../../components/states/index.js';
import { useBrowserState } from '../hooks/use-browser-state.js';
import { useColumnChoice } from '../hooks/use-column-choice.js';
import { useNameHighlights } from '../hooks/use-name-highlights.js';
import {
  browserStateToQuery,
  countActiveFilters,
  EMPTY_STATE,
  FILTER_KEYS,
  type BrowserState,
  type SortOrder,
  type SpeciesSort,
} from '../utils/browser-state.js';
import { FilterPanel } from './filter-panel.js';
import { Pager } from './pager.js';
import { ResultsHeader } from './results-header.js';
import { SearchField } from './search-field.js';
import { useBrowserStyles } from './species-browser.styles.js';
import { SpeciesTable } from './species-table.js';

const NO_ITEMS: SpeciesSummary[] = [];
const CLEARED: Partial<BrowserState> = Object.fromEntries(FILTER_KEYS.map((k) => [k, EMPTY_STATE[k]]));

/** The orders the API applies when none is asked for: best match while searching, else common name. */
function effectiveSort(state: BrowserState): SpeciesSort {
  const isSearching = state.q.trim() !== '';
  if (!state.sort || (state.sort === 'relevance' && !isSearching)) return isSearching ? 'relevance' : 'name';
  return state.sort;
}

/** Search, filter, sort and page the catalogue; every choice lives in the URL. */
export function SpeciesBrowser() {
  const { t } = useTranslation('species');
  const styles = useBrowserStyles();
  const { state, update } = useBrowserState();
  const query = useMemo(() => browserStateToQuery(state), [state]);
  const list = useQuery(speciesListQueryOptions(query));
  const columns = useColumnChoice();
  const items = list.data?.items ?? NO_ITEMS;
  const highlights = useNameHighlights(items, state.q);
  const [areFiltersOpen, setFiltersOpen] = useState(false);
  const headingRef = useRef<HTMLHeadingElement>(null);
  const headingId = useId();
  const filtersId = useId();
  const sort = effectiveSort(state);
  const activeFilters = countActiveFilters(state);

  const onSort = (next: SpeciesSort, order: SortOrder) => update({ sort: next, order });
  const goToPage = (page: number) => {
    update({ page });
    // Start reading the new page from its top, as a new page of a book would.
    headingRef.current?.focus();
    headingRef.current?.scrollIntoView?.({ block: 'start' });
  };

  const data = list.data;
  const pageCount = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const first = data && data.items.length > 0 ? (data.page - 1) * data.pageSize + 1 : 0;
  const last = data ? first + data.items.length - 1 : 0;

  const body = (
    <QueryState
      query={list}
      keepDataOnError
      loading={
        <ContentCard>
          <Skeleton aria-label={t('results.loading')}>
            {Array.from({ length: 6 }, (_, i) => (
              <SkeletonItem key={i} size={24} className={styles.skeletonRow} />
            ))}
          </Skeleton>
        </ContentCard>
      }
      error={t('results.error')}
      isEmpty={(d) => d.items.length === 0}
      empty={(d) =>
        d.total > 0 ? (
          <EmptyState title={t('results.noPage', { page: state.page })}>
            <Button className={styles.emptyAction} onClick={() => goToPage(pageCount)}>
              {t('results.lastPage', { count: pageCount })}
            </Button>
          </EmptyState>
        ) : (
          <EmptyState title={t('results.none')}>
            {activeFilters > 0 ? t('results.noneFilters') : t('results.noneSearch')}
            {activeFilters > 0 ? (
              <>
                <br />
                <Button className={styles.emptyAction} onClick={() => update(CLEARED)}>
                  {t('filters.clear')}
                </Button>
              </>
            ) : null}
          </EmptyState>
        )
      }
    >
      {() => (
        <div className={mergeClasses(list.isPlaceholderData && styles.stale)}>
          <SpeciesTable
            items={items}
            columns={columns.shown}
            highlights={highlights}
            sort={sort}
            order={state.order}
            onSort={onSort}
            captionId={headingId}
          />
        </div>
      )}
    </QueryState>
  );

  return (
    <>
      <SearchField value={state.q} onSearch={(q, options) => update({ q }, options)} />
      <div className={styles.filterToggle}>
        <Button
          icon={<Filter20Regular />}
          aria-expanded={areFiltersOpen}
          aria-controls={filtersId}
          onClick={() => setFiltersOpen((o) => !o)}
        >
          {activeFilters > 0
            ? t('filters.setCount', {
                label: areFiltersOpen ? t('filters.hide') : t('filters.show'),
                count: activeFilters,
              })
            : areFiltersOpen
              ? t('filters.hide')
              : t('filters.show')}
        </Button>
      </div>
      <div id={filtersId} className={mergeClasses(styles.filters, !areFiltersOpen && styles.filtersFolded)}>
        <ContentCard aria-label={t('filters.title')}>
          <FilterPanel state={state} onChange={(change) => update(change)} onClear={() => update(CLEARED)} />
        </ContentCard>
      </div>
      <section aria-labelledby={headingId}>
        <ResultsHeader
          ref={headingRef}
          headingId={headingId}
          total={data?.total}
          first={first}
          last={last}
          query={state.q.trim()}
          isUpdating={list.isFetching && !list.isPending}
          sort={sort}
          order={state.order}
          onSort={onSort}
          columns={columns.shown}
          onColumns={columns.setShown}
        />
        {list.isError && data ? (
          <ErrorState
            title={t('results.updateError')}
            message={list.error.message}
            onRetry={() => void list.refetch()}
          />
        ) : null}
        {body}
        <p className={styles.notes}>{t('results.notes')}</p>
        {data && data.total > 0 ? (
          <Pager
            page={state.page}
            pageCount={pageCount}
            pageSize={state.pageSize}
            onPage={goToPage}
            onPageSize={(pageSize) => update({ pageSize })}
          />
        ) : null}
      </section>
    </>
  );
}
