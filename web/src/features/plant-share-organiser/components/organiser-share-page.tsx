import { useQuery } from '@tanstack/react-query';
import { shareQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { RouterButton } from '../../../components/links/router-link.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { ErrorState, QueryState } from '../../../components/states/index.js';
import { paths } from '../../../config/paths.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useTranslation } from 'react-i18next';
import { OpenShareForm } from './open-share-form.js';
import { useOrganiserStyles } from './organiser.styles.js';
import { AddSpeciesCard } from './add-species-card.js';
import { EditShareCard } from './edit-share-card.js';
import { ShareDayCard } from './share-day-card.js';
import { SlotsCard } from './slots-card.js';
import { ShareStatusCard } from './share-status-card.js';
import { StockCard } from './stock-card.js';
import { WaitlistCard } from './waitlist-card.js';

/**
 * The organiser's plant share: before it is opened, the form that opens it; afterwards its status,
 * its day and the ways to change it (day, place, limits, slots), the plants on offer (with new
 * species and plants that got ready), the waitlist, and the way to pickup day and the season report.
 */
export function OrganiserSharePage({ groupSlug, groupName }: { groupSlug: string; groupName: string }) {
  const { t } = useTranslation('organiser');
  const styles = useOrganiserStyles();
  const share = useQuery(shareQueryOptions(groupSlug));
  return (
    <>
      <PageIntro title={t('title')}>{t('lead', { group: groupName })}</PageIntro>
      <QueryState
        query={share}
        loading={t('loading')}
        error={(error, retry) =>
          isApiRequestError(error) && error.statusCode === 404 ? (
            <OpenShareForm groupSlug={groupSlug} />
          ) : (
            <ErrorState title={t('loadFailed')} message={error.message} onRetry={retry} />
          )
        }
      >
        {(s) => (
          <div className={styles.stack}>
            <div className={styles.actions}>
              <RouterButton to={paths.plantSharePickup.build()} appearance="primary">
                {t('pickupLink')}
              </RouterButton>
              <RouterButton to={paths.plantShareReport.build()}>{t('reportLink')}</RouterButton>
            </div>
            <ShareStatusCard share={s} />
            <ShareDayCard share={s} publicHref={paths.shareAvailable.build(s.groupSlug)} />
            <EditShareCard key={`edit-${s.id}`} share={s} />
            <SlotsCard key={`slots-${s.id}-${s.slots.length}`} share={s} />
            <StockCard key={`stock-${s.id}-${s.stock.length}`} share={s} />
            <AddSpeciesCard share={s} />
            <WaitlistCard groupSlug={s.groupSlug} />
          </div>
        )}
      </QueryState>
    </>
  );
}
