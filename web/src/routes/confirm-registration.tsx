import { useCallback } from 'react';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router-dom';
import type { AuthResponse } from '@homeground/shared';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { ConfirmRegistration, useSession } from '../features/auth/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { useAuthPageStyles } from './auth-layout.styles.js';

/** The link in a sign-up confirmation e-mail: the account is made, and the person lands signed in. */
export function ConfirmRegistrationRoute() {
  const styles = useAuthPageStyles();
  const { t } = useTranslation('forms');
  const { token = '' } = useParams();
  const session = useSession();
  const navigate = useNavigate();
  useDocumentTitle(t('confirm.title'));
  const { signIn } = session;
  const onConfirmed = useCallback(
    (auth: AuthResponse, next: string | undefined) => {
      signIn(auth);
      navigate(next ?? paths.account.build(), { replace: true });
    },
    [signIn, navigate],
  );
  return (
    <div className={styles.column}>
      <PageIntro title={t('confirm.title')} />
      <ConfirmRegistration token={token} onConfirmed={onConfirmed} />
    </div>
  );
}
