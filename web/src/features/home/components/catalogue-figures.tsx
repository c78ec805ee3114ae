import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/index.js';
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

/** Live counts from GET /api/stats, with a note when GET /api/health says the database is down. */
export function CatalogueFigures() {
  const styles = useStyles();
  const { t } = useTranslation('home');
  const format = useFormatters();
  const stats = useQuery(statsQueryOptions());

  return (
    <ContentCard aria-labelledby="catalogue-today">
      <Heading level="section" id="catalogue-today">
        {t('figures.title')}
      </Heading>
      <QueryState
        query={stats}
        loading={
          <Skeleton aria-label={t('figures.loading')}>
            <SkeletonItem size={48} />
          </Skeleton>
        }
        error={t('figures.error')}
      >
        {(data) => (
          <dl className={styles.list}>
            {[
              { label: t('figures.species'), value: data.species },
              { label: t('figures.groups'), value: data.groups },
              { label: t('figures.ecoregions'), value: data.ecoregions },
            ].map((f) => (
              <div key={f.label} className={styles.figure}>
                <dt className={styles.label}>{f.label}</dt>
                <dd className={styles.value}>{format.number(f.value)}</dd>
              </div>
            ))}
          </dl>
        )}
      </QueryState>
      <CatalogueStatusNote />
    </ContentCard>
  );
}
