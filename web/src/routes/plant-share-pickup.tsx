import { Navigate, useLocation } from 'react-router-dom';
import { ErrorState, LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { PickupPage } from '../features/plant-share-organiser/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { organisedGroup } from './plant-share-session.js';

/** Pickup day (lists, check-in, walk-up) for the organiser's group; names are for organisers only. */
export function PlantSharePickupRoute() {
  const session = useSession();
  const { pathname } = useLocation();
  useDocumentTitle('Pickup day');
  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading') return <LoadingState label="Loading the plant share" />;
  if (!session.user) {
    return (
      <ErrorState
        title="Your account details did not load."
        message={session.profileError?.message}
        onRetry={session.retryProfile}
      />
    );
  }
  const group = organisedGroup(session.user);
  if (!group) return <Navigate to={paths.plantShare.build()} replace />;
  return <PickupPage key={group.slug} groupSlug={group.slug} />;
}
