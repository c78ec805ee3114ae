import { useNavigate, useParams } from 'react-router-dom';
import { LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/index.js';
import { AcceptInvitation } from '../features/invitation/index.js';
import { useTranslation } from 'react-i18next';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** The link in an invitation e-mail: accept, then land on the group's page signed in. */
export function InvitationRoute() {
  const { token = '' } = useParams();
  const session = useSession();
  const navigate = useNavigate();
  const { t } = useTranslation('groups');
  useDocumentTitle(t('invitation.pageTitle'));
  if (session.status === 'loading') return <LoadingState label={t('invitation.checking')} />;
  return (
    <AcceptInvitation
      token={token}
      user={session.user}
      onJoined={(auth) => {
        session.signIn(auth);
        const joined = auth.user.groups.at(-1);
        navigate(joined ? paths.group.build(joined.groupSlug) : paths.account.build());
      }}
    />
  );
}
