import type { ReactNode } from 'react';
import { PageIntro } from '../components/page/page-intro.js';
import { EmptyState } from '../components/states/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { SignedInGate } from './signed-in-gate.js';

/** The words a curator's page frames itself with, in the page's language. */
export interface CuratorPageWords {
  title: string;
  intro: string;
  loading: string;
  notCurator: string;
}

/**
 * A curator's desk page (reference checks, CSV import): signed in, titled and introduced; curators and
 * admins get the tool, anyone else a plain sentence that it is for curators (the API refuses them too).
 */
export function CuratorPage({ words, children }: { words: CuratorPageWords; children: ReactNode }) {
  useDocumentTitle(words.title);
  return (
    <SignedInGate loading={words.loading}>
      {(user) => (
        <>
          <PageIntro title={words.title}>{words.intro}</PageIntro>
          {user.role === 'curator' || user.role === 'admin' ? children : <EmptyState title={words.notCurator} />}
        </>
      )}
    </SignedInGate>
  );
}
