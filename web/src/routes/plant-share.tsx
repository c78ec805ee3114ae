import { ErrorState, LoadingState } from '../components/states/index.js';
import { useSession } from '../features/auth/index.js';
import { OrganiserSharePage } from '../features/plant-share-organiser/index.js';
import { ShareDirectory } from '../features/plant-share-taker/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { useTranslation } from 'react-i18next';
import { organisedGroup } from './plant-share-session.js';

/**
 * Plant share from the navigation: an organiser runs their group's share here; everyone else (signed
 * in or not) finds a group's public page to reserve from.
 */
export function PlantShareRoute() {
  const session = useSession();
  const { t } = useTranslation('organiser');
  useDocumentTitle(t('title'));
  if (session.status === 'loading') return <LoadingState label={t('loading')} />;
  if (session.status === 'signed-in' && !session.user) {
    return (
      <ErrorState
        title={t('account.loadError', { ns: 'forms' })}
        message={session.profileError?.message}
        onRetry={session.retryProfile}
      />
    );
  }
  const group = organisedGroup(session.user);
  if (!group) return <ShareDirectory />;
  return <OrganiserSharePage key={group.slug} groupSlug={group.slug} groupName={group.name} />;
}
