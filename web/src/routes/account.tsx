import { useTranslation } from 'react-i18next';
import { Navigate, useLocation } from 'react-router-dom';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState, LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { AccountDetails } from '../features/account/index.js';
import { useSession } from '../features/auth/index.js';
import { SavedMixesList } from '../features/yard-mix/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function AccountRoute() {
  const session = useSession();
  const { pathname } = useLocation();
  const { t } = useTranslation('forms');
  useDocumentTitle(t('account.title'));

  if (session.status === 'signed-out') return <Navigate to={paths.signIn.build(pathname)} replace />;
  if (session.status === 'loading') return <LoadingState label={t('account.loading')} />;

  return (
    <>
      <PageIntro title={t('account.title')} />
      {session.user ? (
        <>
          <AccountDetails user={session.user} />
          <SavedMixesList />
        </>
      ) : (
        <ErrorState
          title={t('account.loadError')}
          message={session.profileError?.message}
          onRetry={session.retryProfile}
        />
      )}
    </>
  );
}
