import { useEffect, useRef } from 'react';
import { useTranslation } from 'react-i18next';
import type { AuthResponse } from '@homeground/shared';
import { useConfirmRegistrationMutation } from '../../../api/auth/auth.mutations.js';
import { RouterLink } from '../../../components/links/router-link.js';
import { ErrorState, LoadingState } from '../../../components/states/index.js';
import { paths, safeNextPath } from '../../../config/paths.js';
import { useSchemaMessage } from '../../../lib/forms/schema-messages.js';

export interface ConfirmRegistrationProps {
  token: string;
  /** Keeps the new account's sign-in, then moves on to `next` (a path on this site) or home. */
  onConfirmed: (auth: AuthResponse, next: string | undefined) => void;
}

/** The page a sign-up confirmation link opens: one request, then the person is signed in. */
export function ConfirmRegistration({ token, onConfirmed }: ConfirmRegistrationProps) {
  const { t } = useTranslation('forms');
  const say = useSchemaMessage();
  const confirm = useConfirmRegistrationMutation();
  // A link is used once: React's development double effects must not send it twice.
  const sent = useRef(false);
  useEffect(() => {
    if (sent.current) return;
    sent.current = true;
    confirm.mutate({ token }, { onSuccess: ({ next, ...auth }) => onConfirmed(auth, safeNextPath(next)) });
  }, [confirm, token, onConfirmed]);

  if (confirm.isError) {
    return (
      <>
        <ErrorState title={t('confirm.failedTitle')} message={say(confirm.error.message)} />
        <p>
          <RouterLink to={paths.register.build()}>{t('confirm.signUpAgain')}</RouterLink> ·{' '}
          <RouterLink to={paths.signIn.build()}>{t('confirm.signIn')}</RouterLink>
        </p>
      </>
    );
  }
  return <LoadingState label={t('confirm.working')} />;
}
