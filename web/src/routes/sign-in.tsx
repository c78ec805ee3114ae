import { useTranslation } from 'react-i18next';
import { Navigate } from 'react-router-dom';
import { RouterLink } from '../components/links/router-link.js';
import { ContentCard } from '../components/page/content-card.js';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { SignInForm, useSession } from '../features/auth/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { useAuthPageStyles } from './auth-layout.styles.js';
import { useNextPath } from './use-next-path.js';

export function SignInRoute() {
  const styles = useAuthPageStyles();
  const { t } = useTranslation('forms');
  const session = useSession();
  const next = useNextPath();
  useDocumentTitle(t('signIn.title'));

  // Covers both a fresh sign-in (the session flips to signed-in) and a signed-in visit.
  if (session.status === 'signed-in') return <Navigate to={next ?? paths.home.build()} replace />;

  return (
    <div className={styles.column}>
      <PageIntro title={t('signIn.title')}>{t('signIn.intro')}</PageIntro>
      <ContentCard>
        <SignInForm onSignedIn={session.signIn} />
      </ContentCard>
      <p className={styles.switch}>
        {t('signIn.newHere')} <RouterLink to={paths.register.build(next)}>{t('signIn.create')}</RouterLink>
      </p>
    </div>
  );
}
