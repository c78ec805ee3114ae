import { useParams } from 'react-router-dom';
import { useSession } from '../features/auth/index.js';
import { GroupPage } from '../features/group/index.js';
import { useTranslation } from 'react-i18next';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A growing group; the viewer's role in it decides what they see (admins act as organisers). */
export function GroupRoute() {
  const { slug = '' } = useParams();
  const session = useSession();
  const { t } = useTranslation('groups');
  useDocumentTitle(t('page.title'));
  const user = session.user;
  const role = user?.role === 'admin' ? 'organiser' : (user?.groups.find((g) => g.groupSlug === slug)?.role ?? null);
  return <GroupPage key={slug} slug={slug} myRole={role} />;
}
