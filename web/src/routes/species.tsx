import type { QueryClient } from '@tanstack/react-query';
import { PageIntro } from '../components/page/page-intro.js';
import { SpeciesBrowser, speciesBrowserLoader } from '../features/species-browser/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function speciesLoader(queryClient: QueryClient) {
  return speciesBrowserLoader(queryClient);
}

export function SpeciesRoute() {
  useDocumentTitle('Species');
  return (
    <>
      <PageIntro title="Species">
        Every native species in the catalogue: when it blooms, how tall it grows, what it feeds, and how to raise it
        from seed. Search by name or narrow the list to your ground.
      </PageIntro>
      <SpeciesBrowser />
    </>
  );
}
