import type { QueryClient } from '@tanstack/react-query';
import { speciesListQueryOptions } from '../../../api/species/species.queries.js';
import { browserStateToQuery, parseBrowserState } from './browser-state.js';

/**
 * Starts the list request for the URL's filters while the page's code is still arriving. Not
 * awaited: the page shows its own skeleton and error states.
 */
export function speciesBrowserLoader(queryClient: QueryClient) {
  return ({ request }: { request: Request }) => {
    const state = parseBrowserState(new URL(request.url).searchParams);
    void queryClient.prefetchQuery(speciesListQueryOptions(browserStateToQuery(state)));
    return null;
  };
}
