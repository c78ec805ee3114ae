import { STATE_NAMES, type StateCode } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { myMixesQueryOptions } from '../../../../api/mixes/mixes.queries.js';
import { ContentCard } from '../../../../components/page/content-card.js';
import { Heading } from '../../../../components/page/page-heading.js';
import { RouterLink } from '../../../../components/links/router-link.js';
import { EmptyState, ErrorState, LoadingState } from '../../../../components/states/index.js';
import { paths } from '../../../../config/paths.js';
import { useFormatters } from '../../../../lib/i18n/index.js';

/** The signed-in person's saved mixes, newest first, each a link that reopens it. */
export function SavedMixesList() {
  const query = useQuery(myMixesQueryOptions());
  const { t } = useTranslation('mix');
  const f = useFormatters();
  return (
    <ContentCard aria-labelledby="saved-mixes-heading">
      <Heading level="section" id="saved-mixes-heading">
        {t('saved.heading')}
      </Heading>
      {query.isPending ? <LoadingState label={t('saved.loading')} /> : null}
      {query.isError ? (
        <ErrorState title={t('saved.error')} message={query.error.message} onRetry={() => void query.refetch()} />
      ) : null}
      {query.data && query.data.length === 0 ? (
        <EmptyState title={t('saved.noneTitle')}>{t('saved.noneText')}</EmptyState>
      ) : null}
      {query.data && query.data.length > 0 ? (
        <ul aria-label={t('saved.heading')}>
          {[...query.data]
            .sort((a, b) => b.createdAt.localeCompare(a.createdAt))
            .map((m) => (
              <li key={m.id}>
                <RouterLink to={paths.savedMix.build(m.id)}>{m.name}</RouterLink>
                {t('saved.line', {
                  count: m.chosen.length,
                  area: f.area(m.request.site.areaSqFt),
                  state: STATE_NAMES[m.request.region.state as StateCode] ?? m.request.region.state,
                })}
              </li>
            ))}
        </ul>
      ) : null}
    </ContentCard>
  );
}
