import { makeStyles, SkeletonItem, Skeleton, tokens } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { statsQueryOptions } from '../../../api/system/system.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { hgTokens } from '../../../theme/index.js';
import { CatalogueStatusNote } from './catalogue-status-note.js';

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

/** Live counts from GET /api/stats, with a note when GET /api/health says the database is down. */
export function CatalogueFigures() {
  const styles = useStyles();
  const stats = useQuery(statsQueryOptions());

  return (
    <ContentCard aria-labelledby="catalogue-today">
      <Heading level="section" id="catalogue-today">
        In the catalogue today
      </Heading>
      <QueryState
        query={stats}
        loading={
          <Skeleton aria-label="Loading the catalogue figures">
            <SkeletonItem size={48} />
          </Skeleton>
        }
        error="The catalogue figures did not load."
      >
        {(data) => (
          <dl className={styles.list}>
            {[
              { label: 'native species in the catalogue', value: data.species },
              { label: 'growing groups', value: data.groups },
              { label: 'ecoregions covered', value: data.ecoregions },
            ].map((f) => (
              <div key={f.label} className={styles.figure}>
                <dt className={styles.label}>{f.label}</dt>
                <dd className={styles.value}>{count.format(f.value)}</dd>
              </div>
            ))}
          </dl>
        )}
      </QueryState>
      <CatalogueStatusNote />
    </ContentCard>
  );
}
