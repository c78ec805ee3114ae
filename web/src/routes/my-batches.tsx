import { PageIntro } from '../components/page/page-intro.js';
import { useTranslation } from 'react-i18next';
import { MyBatchesPage } from '../features/my-batches/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/** A grower's batches in the group they grow for (an organiser who also grows sees theirs too). */
export function MyBatchesRoute() {
  const { t } = useTranslation('batches');
  useDocumentTitle(t('page.title'));
  return (
    <SignedInGate loading={t('page.loading')}>
      {(user) => {
        const membership =
          user.groups.find((g) => g.role === 'grower') ?? user.groups.find((g) => g.role === 'organiser');
        if (!membership) return <PageIntro title={t('page.title')}>{t('page.notGrower')}</PageIntro>;
        return <MyBatchesPage key={membership.groupSlug} slug={membership.groupSlug} userId={user.id} />;
      }}
    </SignedInGate>
  );
}
