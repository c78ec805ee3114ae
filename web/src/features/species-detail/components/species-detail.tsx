import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { ArrowLeft20Regular } from '@fluentui/react-icons';
import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import type { SpeciesDetail as SpeciesRecord } from '../../../api/species/species.api.js';
import { speciesDetailQueryOptions } from '../../../api/species/species.queries.js';
import { RouterLink } from '../../../components/links/router-link.js';
import { ErrorState, QueryState } from '../../../components/states/index.js';
import { paths } from '../../../config/paths.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useDocumentTitle } from '../../../lib/use-document-title.js';
import { CautionPanel } from './caution-panel.js';
import { GerminationGuide } from './germination-guide.js';
import { GrowingConditions, SizeAndHabit } from './growing-conditions.js';
import { NativeRange } from './native-range.js';
import { SpeciesHeader } from './species-header.js';
import { SpeciesNotFound } from './species-not-found.js';
import { WildlifeValue } from './wildlife-value.js';

const useStyles = makeStyles({
  back: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    marginBottom: tokens.spacingVerticalL,
  },
  stack: { display: 'grid', gap: tokens.spacingVerticalXL },
  columns: {
    display: 'grid',
    gridTemplateColumns: 'repeat(2, minmax(0, 1fr))',
    gap: tokens.spacingVerticalXL,
    alignItems: 'start',
    '@media (max-width: 880px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
});

export interface SpeciesDetailProps {
  slug: string;
  /** The bloom strip for this species; the route supplies it from the species browser. */
  renderBloomStrip: (species: SpeciesRecord) => ReactNode;
  /** Words for the bloom months, e.g. "Blooms Jun–Aug". */
  describeBloom: (bloomMonths: readonly number[]) => string;
}

/** Everything the catalogue knows about one species, grouped as a grower reads it, each group sourced. */
export function SpeciesDetail({ slug, renderBloomStrip, describeBloom }: SpeciesDetailProps) {
  const styles = useStyles();
  const { t } = useTranslation('detail');
  const detail = useQuery(speciesDetailQueryOptions(slug));
  const name = detail.data?.commonNames[0];
  useDocumentTitle(
    detail.data
      ? name
        ? `${name.charAt(0).toUpperCase()}${name.slice(1)}`
        : detail.data.scientificName
      : detail.isError
        ? t('page.notFound')
        : t('page.species'),
  );

  const back = (
    <RouterLink to={paths.species.build()} className={styles.back}>
      <ArrowLeft20Regular aria-hidden /> {t('page.allSpecies')}
    </RouterLink>
  );

  const failed = (error: Error, retry: () => void) =>
    isApiRequestError(error) && error.statusCode === 404 ? (
      <SpeciesNotFound slug={slug} />
    ) : (
      <>
        {back}
        <ErrorState title={t('page.loadError')} message={error.message} onRetry={retry} />
      </>
    );

  return (
    <QueryState query={detail} loading={t('page.loading')} error={failed}>
      {(species) => (
        <>
          {back}
          <div className={styles.stack}>
            <SpeciesHeader
              species={species}
              bloomStrip={renderBloomStrip(species)}
              bloomWords={describeBloom(species.bloomMonths)}
            />
            <CautionPanel species={species} />
            <div className={styles.columns}>
              <div className={styles.stack}>
                <GerminationGuide species={species} />
                <WildlifeValue species={species} />
              </div>
              <div className={styles.stack}>
                <GrowingConditions species={species} />
                <SizeAndHabit species={species} />
                <NativeRange species={species} />
              </div>
            </div>
          </div>
        </>
      )}
    </QueryState>
  );
}
