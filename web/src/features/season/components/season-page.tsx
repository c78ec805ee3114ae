import type { Season } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { seasonQueryOptions } from '../../../api/seasons/seasons.queries.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { QueryState } from '../../../components/states/index.js';
import { useTargetDraft } from '../hooks/use-target-draft.js';
import { SeasonDates } from './season-dates.js';
import { SeedListCard } from './seed-list-card.js';
import { ShareListCard } from './share-list-card.js';
import { TargetsCard } from './targets-card.js';
import { useSeasonStyles } from './season.styles.js';

/**
 * A group's season plan. `canEdit` is true for the group's organisers (and admins): they edit the
 * targets and ask for a share list; growers and members read the plan and the seed list.
 */
export function SeasonPage({ slug, canEdit }: { slug: string; canEdit: boolean }) {
  const { t } = useTranslation('season');
  const season = useQuery(seasonQueryOptions(slug));
  return (
    <QueryState query={season} loading={t('page.loading')} error={t('page.failed')}>
      {(s) => <SeasonPlan slug={slug} season={s} canEdit={canEdit} />}
    </QueryState>
  );
}

function SeasonPlan({ slug, season, canEdit }: { slug: string; season: Season; canEdit: boolean }) {
  const styles = useSeasonStyles();
  const { t } = useTranslation('season');
  const draft = useTargetDraft(season);
  return (
    <>
      <div data-print-intro>
        <PageIntro title={t('page.titleYear', { year: season.year })}>
          {season.place.ecoregionCode
            ? t('page.whereEcoregion', {
                group: season.groupName,
                town: season.place.town,
                code: season.place.ecoregionCode,
              })
            : t('page.where', { group: season.groupName, town: season.place.town })}{' '}
          {canEdit ? t('page.leadOrganiser') : t('page.leadReader')}
        </PageIntro>
      </div>
      <div className={styles.stack} data-season-cards>
        <SeasonDates season={season} slug={slug} canEdit={canEdit} />
        <TargetsCard slug={slug} season={season} draft={canEdit ? draft : null} />
        {canEdit ? <ShareListCard slug={slug} season={season} draft={draft} /> : null}
        <SeedListCard slug={slug} />
      </div>
    </>
  );
}
