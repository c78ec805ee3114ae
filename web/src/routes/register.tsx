import { useTranslation } from 'react-i18next';
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
  const { t } = useTranslation('forms');
  const session = useSession();
  const next = useNextPath();
  useDocumentTitle(t('register.title'));

  if (session.status === 'signed-in') return <Navigate to={next ?? paths.home.build()} replace />;

  return (
    <div className={styles.column}>
      <PageIntro title={t('register.title')}>{t('register.intro')}</PageIntro>
      <ContentCard>
        <RegisterForm next={next} />
      </ContentCard>
      <p className={styles.switch}>
        {t('register.haveAccount')} <RouterLink to={paths.signIn.build(next)}>{t('register.signIn')}</RouterLink>
      </p>
    </div>
  );
}
