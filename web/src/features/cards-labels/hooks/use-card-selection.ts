import { useQuery } from '@tanstack/react-query';
import { useCallback, useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { savedMixQueryOptions } from '../../../api/mixes/mixes.queries.js';
import { paths } from '../../../config/paths.js';

/**
 * The species chosen for printing, kept in the URL (`?species=a,b`, or `?mix=<saved mix id>` from a
 * yard mix) so the page can be bookmarked or sent on as it is. A saved mix's species join the list
 * once they arrive; from then on the link names them one by one.
 */
export function useCardSelection() {
  const [params, setParams] = useSearchParams();
  const { species: slugs, mix: mixId } = paths.cardsLabels.parse(params);

  const setSlugs = useCallback(
    (next: string[]) => setParams(() => paths.cardsLabels.search({ species: next }), { replace: true }),
    [setParams],
  );

  const mix = useQuery({ ...savedMixQueryOptions(mixId ?? ''), enabled: Boolean(mixId) });
  useEffect(() => {
    if (mixId && mix.data) setSlugs([...slugs, ...mix.data.chosen.filter((s) => !slugs.includes(s))]);
    // slugs is read at the moment the mix arrives; re-running on every list change would re-add removed ones.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [mixId, mix.data, setSlugs]);

  return {
    slugs,
    add: (added: readonly string[]) => setSlugs([...slugs, ...added.filter((s) => !slugs.includes(s))]),
    remove: (slug: string) => setSlugs(slugs.filter((s) => s !== slug)),
    clear: () => setSlugs([]),
    /** True while a saved mix named in the link is still loading. */
    isMixLoading: Boolean(mixId) && mix.isPending,
    /** True when the link's saved mix could not be opened, so its species were not added. */
    isMixMissing: Boolean(mixId) && mix.isError,
  };
}
