import { Navigate } from 'react-router-dom';
import { RouterLink } from '../components/links/router-link.js';
import { ContentCard } from '../components/page/content-card.js';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { RegisterForm, useSession } from '../features/auth/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { useAuthPageStyles } from './auth-layout.styles.js';
import { useNextPath } from './use-next-path.js';

export function RegisterRoute() {
  const styles = useAuthPageStyles();
  const session = useSession();
  const next = useNextPath();
  useDocumentTitle('Create an account');

  if (session.status === 'signed-in') return <Navigate to={next ?? paths.home.build()} replace />;

  return (
    <div className={styles.column}>
      <PageIntro title="Create an account">
        An account lets you join a growing group, keep your batch log and reserve plants.
      </PageIntro>
      <ContentCard>
        <RegisterForm onRegistered={session.signIn} />
      </ContentCard>
      <p className={styles.switch}>
        Already have an account? <RouterLink to={paths.signIn.build(next)}>Sign in</RouterLink>
      </p>
    </div>
  );
}
