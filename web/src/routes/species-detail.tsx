import { useTranslation } from 'react-i18next';
import { useWords } from '../lib/i18n/index.js';
import { RouterButton } from '../components/links/router-link.js';
import { paths } from '../config/paths.js';
import type { QueryClient } from '@tanstack/react-query';
import { type LoaderFunctionArgs, useParams } from 'react-router-dom';
import { speciesDetailQueryOptions } from '../api/species/species.queries.js';
import { BloomStrip } from '../features/species-browser/index.js';
import { useSession } from '../features/auth/index.js';
import { SpeciesDetail } from '../features/species-detail/index.js';
import { SpeciesHistoryPanel } from '../features/species-history/index.js';
import { RecordReferencePanel } from '../features/species-reference/index.js';

/** Starts the record's request while the page's code arrives; the page shows loading, 404 and errors itself. */
export function speciesDetailLoader(queryClient: QueryClient) {
  return ({ params }: LoaderFunctionArgs) => {
    if (params.slug) void queryClient.prefetchQuery(speciesDetailQueryOptions(params.slug));
    return null;
  };
}

export function SpeciesDetailRoute() {
  const { slug = '' } = useParams();
  const words = useWords();
  const role = useSession().user?.role;
  const curates = role === 'curator' || role === 'admin';
  const { t } = useTranslation('editor');
  return (
    <>
      {curates ? (
        <RouterButton to={paths.speciesEdit.build(slug)} appearance="secondary">
          {t('page.edit')}
        </RouterButton>
      ) : null}
      <SpeciesDetail
        // A new slug is a new page: start its state (photo fallback, open details) afresh.
        key={slug}
        slug={slug}
        describeBloom={words.bloomWords}
        renderBloomStrip={(s) => (
          <BloomStrip bloomMonths={s.bloomMonths} flowerColours={s.flowerColours} size="large" />
        )}
      />
      {curates ? <RecordReferencePanel key={`reference-${slug}`} slug={slug} /> : null}
      {curates ? <SpeciesHistoryPanel key={`history-${slug}`} slug={slug} /> : null}
    </>
  );
}
