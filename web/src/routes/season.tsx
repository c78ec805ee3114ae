import { Navigate, useLocation } from 'react-router-dom';
import { ErrorState, LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { NoSeasonGroup, SeasonPage } from '../features/season/index.js';
import { SeasonBatchesPanel } from '../features/season-batches/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

/**
 * The season plan of the signed-in person's group: the group they organise first, else one they grow
 * for or belong to (read only). Admins edit any group's plan, as the API allows.
 */
export function SeasonRoute() {
  const session = useSession();
  const { pathname } = useLocation();
  useDocumentTitle('Season');

  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading') return <LoadingState label="Loading your season" />;
  const user = session.user;
  if (!user) {
    return (
      <ErrorState
        title="Your account details did not load."
        message={session.profileError?.message}
        onRetry={session.retryProfile}
      />
    );
  }
  const membership = user.groups.find((g) => g.role === 'organiser') ?? user.groups[0];
  if (!membership) return <NoSeasonGroup />;
  const canEdit = membership.role === 'organiser' || user.role === 'admin';
  return (
    <>
      <SeasonPage key={membership.groupSlug} slug={membership.groupSlug} canEdit={canEdit} />
      {/* Growers, batches and progress are the organisers' (the API answers 403 to others). */}
      {canEdit ? <SeasonBatchesPanel key={`batches-${membership.groupSlug}`} slug={membership.groupSlug} /> : null}
    </>
  );
}
