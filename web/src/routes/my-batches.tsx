import { Navigate, useLocation } from 'react-router-dom';
import { ErrorState, LoadingState } from '../components/states/index.js';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { MY_BATCHES_WORDS, MyBatchesPage } from '../features/my-batches/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A grower's batches in the group they grow for (an organiser who also grows sees theirs too). */
export function MyBatchesRoute() {
  const session = useSession();
  const { pathname } = useLocation();
  useDocumentTitle(MY_BATCHES_WORDS.title);

  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading') return <LoadingState label={MY_BATCHES_WORDS.loading} />;
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
  const membership = user.groups.find((g) => g.role === 'grower') ?? user.groups.find((g) => g.role === 'organiser');
  if (!membership) return <PageIntro title={MY_BATCHES_WORDS.title}>{MY_BATCHES_WORDS.notGrower}</PageIntro>;
  return <MyBatchesPage key={membership.groupSlug} slug={membership.groupSlug} userId={user.id} />;
}
