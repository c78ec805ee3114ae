import { Navigate, useLocation } from 'react-router-dom';
import { ErrorState, LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { ShareReportPage } from '../features/share-report/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { organisedGroup } from './plant-share-session.js';

/** The season report of the organiser's group's plant share. */
export function PlantShareReportRoute() {
  const session = useSession();
  const { pathname } = useLocation();
  useDocumentTitle('Season report');
  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading') return <LoadingState label="Loading the season report" />;
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
  return <ShareReportPage key={group.slug} groupSlug={group.slug} />;
}
