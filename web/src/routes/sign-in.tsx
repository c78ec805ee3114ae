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
  const session = useSession();
  const next = useNextPath();
  useDocumentTitle('Sign in');

  // Covers both a fresh sign-in (the session flips to signed-in) and a signed-in visit.
  if (session.status === 'signed-in') return <Navigate to={next ?? paths.home.build()} replace />;

  return (
    <div className={styles.column}>
      <PageIntro title="Sign in">
        Plan your season, keep your batch log and reserve plants at the plant share.
      </PageIntro>
      <ContentCard>
        <SignInForm onSignedIn={session.signIn} />
      </ContentCard>
      <p className={styles.switch}>
        New to Homeground? <RouterLink to={paths.register.build(next)}>Create an account</RouterLink>
      </p>
    </div>
  );
}
