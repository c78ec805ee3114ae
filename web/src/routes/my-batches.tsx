import { PageIntro } from '../components/page/page-intro.js';
import { MY_BATCHES_WORDS, MyBatchesPage } from '../features/my-batches/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/** A grower's batches in the group they grow for (an organiser who also grows sees theirs too). */
export function MyBatchesRoute() {
  useDocumentTitle(MY_BATCHES_WORDS.title);
  return (
    <SignedInGate loading={MY_BATCHES_WORDS.loading}>
      {(user) => {
        const membership =
          user.groups.find((g) => g.role === 'grower') ?? user.groups.find((g) => g.role === 'organiser');
        if (!membership) return <PageIntro title={MY_BATCHES_WORDS.title}>{MY_BATCHES_WORDS.notGrower}</PageIntro>;
        return <MyBatchesPage key={membership.groupSlug} slug={membership.groupSlug} userId={user.id} />;
      }}
    </SignedInGate>
  );
}
