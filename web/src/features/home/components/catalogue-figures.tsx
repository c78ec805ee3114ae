import { makeStyles, SkeletonItem, Skeleton, tokens } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { statsQueryOptions } from '../../../api/system/system.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { ErrorState } from '../../../components/states/index.js';
import { hgTokens } from '../../../theme/index.js';
import { ApiStatusLine } from './api-status-line.js';

const useStyles = makeStyles({
  list: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(160px, 1fr))',
    gap: tokens.spacingHorizontalL,
    margin: `0 0 ${tokens.spacingVerticalL}`,
  },
  figure: { display: 'flex', flexDirection: 'column-reverse', gap: tokens.spacingVerticalXS },
  value: {
    margin: 0,
    fontFamily: hgTokens.hgFontFamilyHeading,
    fontWeight: 700,
    fontSize: '36px',
    lineHeight: '44px',
    color: tokens.colorBrandForeground1,
    fontVariantNumeric: 'tabular-nums',
  },
  label: { color: hgTokens.hgColorLoam },
});

const count = new Intl.NumberFormat('en-US');

/** Live counts from GET /api/stats and the API version from GET /api/health. */
export function CatalogueFigures() {
  const styles = useStyles();
  const stats = useQuery(statsQueryOptions());

  let body;
  if (stats.isPending) {
    body = (
      <Skeleton aria-label="Loading the catalogue figures">
        <SkeletonItem size={48} />
      </Skeleton>
    );
  } else if (stats.isError) {
    body = (
      <ErrorState
        title="The catalogue figures did not load."
        message={stats.error.message}
        onRetry={() => void stats.refetch()}
      />
    );
  } else {
    const figures = [
      { label: 'native species in the catalogue', value: stats.data.species },
      { label: 'growing groups', value: stats.data.groups },
      { label: 'ecoregions covered', value: stats.data.ecoregions },
    ];
    body = (
      <dl className={styles.list}>
        {figures.map((f) => (
          <div key={f.label} className={styles.figure}>
            <dt className={styles.label}>{f.label}</dt>
            <dd className={styles.value}>{count.format(f.value)}</dd>
          </div>
        ))}
      </dl>
    );
  }

  return (
    <ContentCard aria-labelledby="catalogue-today">
      <Heading level="section" id="catalogue-today">
        In the catalogue today
      </Heading>
      {body}
      <ApiStatusLine />
    </ContentCard>
  );
}
