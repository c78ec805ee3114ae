import { NoSeasonGroup, SeasonPage } from '../features/season/index.js';
import { SeasonBatchesPanel } from '../features/season-batches/index.js';
import { useTranslation } from 'react-i18next';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/**
 * The season plan of the signed-in person's group: the group they organise first, else one they grow
 * for or belong to (read only). Admins edit any group's plan, as the API allows.
 */
export function SeasonRoute() {
  const { t } = useTranslation('season');
  useDocumentTitle(t('page.title'));
  return (
    <SignedInGate loading={t('page.loading')}>
      {(user) => {
        const membership = user.groups.find((g) => g.role === 'organiser') ?? user.groups[0];
        if (!membership) return <NoSeasonGroup />;
        const canEdit = membership.role === 'organiser' || user.role === 'admin';
        return (
          <>
            <SeasonPage key={membership.groupSlug} slug={membership.groupSlug} canEdit={canEdit} />
            {/* Growers, batches and progress are the organisers' (the API answers 403 to others). */}
            {canEdit ? (
              <SeasonBatchesPanel key={`batches-${membership.groupSlug}`} slug={membership.groupSlug} />
            ) : null}
          </>
        );
      }}
    </SignedInGate>
  );
}
