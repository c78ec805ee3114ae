import type { Season } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
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
  const season = useQuery(seasonQueryOptions(slug));
  return (
    <QueryState query={season} loading="Loading the season plan" error="The season plan did not load.">
      {(s) => <SeasonPlan slug={slug} season={s} canEdit={canEdit} />}
    </QueryState>
  );
}

function SeasonPlan({ slug, season, canEdit }: { slug: string; season: Season; canEdit: boolean }) {
  const styles = useSeasonStyles();
  const draft = useTargetDraft(season);
  return (
    <>
      <div data-print-intro>
        <PageIntro title={`Season plan ${season.year}`}>
          {season.groupName}, {season.place.town}
          {season.place.ecoregionCode ? ` (ecoregion ${season.place.ecoregionCode})` : ''}.{' '}
          {canEdit
            ? 'Set the targets, ask for a share list, and buy or collect what the seed list says.'
            : 'The organisers set this plan; ask them if something should change.'}
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
