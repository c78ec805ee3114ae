import { formatArea, STATE_NAMES, type StateCode } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { myMixesQueryOptions } from '../../../../api/mixes/mixes.queries.js';
import { ContentCard } from '../../../../components/page/content-card.js';
import { Heading } from '../../../../components/page/page-heading.js';
import { RouterLink } from '../../../../components/links/router-link.js';
import { EmptyState, ErrorState, LoadingState } from '../../../../components/states/index.js';
import { paths } from '../../../../config/paths.js';

/** The signed-in person's saved mixes, newest first, each a link that reopens it. */
export function SavedMixesList() {
  const query = useQuery(myMixesQueryOptions());
  return (
    <ContentCard aria-labelledby="saved-mixes-heading">
      <Heading level="section" id="saved-mixes-heading">
        Your saved mixes
      </Heading>
      {query.isPending ? <LoadingState label="Loading your saved mixes" /> : null}
      {query.isError ? (
        <ErrorState
          title="Your saved mixes did not load."
          message={query.error.message}
          onRetry={() => void query.refetch()}
        />
      ) : null}
      {query.data && query.data.length === 0 ? (
        <EmptyState title="No saved mixes yet">Save a yard mix from Find plants and it will be listed here.</EmptyState>
      ) : null}
      {query.data && query.data.length > 0 ? (
        <ul aria-label="Your saved mixes">
          {[...query.data]
            .sort((a, b) => b.createdAt.localeCompare(a.createdAt))
            .map((m) => (
              <li key={m.id}>
                <RouterLink to={paths.savedMix.build(m.id)}>{m.name}</RouterLink>
                {` — ${m.chosen.length} species for ${formatArea(m.request.site.areaSqFt)} in ${STATE_NAMES[m.request.region.state as StateCode] ?? m.request.region.state}`}
              </li>
            ))}
        </ul>
      ) : null}
    </ContentCard>
  );
}
