import type { SpeciesSummary } from '@homeground/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { useTranslation } from 'react-i18next';
import { speciesListQueryOptions } from '../../../api/species/species.queries.js';

export interface ResolvedName {
  typed: string;
  match: SpeciesSummary | null;
}

export type ResolveState =
  | { status: 'idle' }
  | { status: 'working'; total: number }
  | { status: 'done'; results: ResolvedName[] }
  | { status: 'failed'; message: string };

/** At most this many lines per paste: a season's list, not a whole catalogue. */
export const MAX_PASTED_NAMES = 100;

/** Lines → distinct names: trimmed, list bullets and numbering removed, blanks dropped. */
export function pastedNames(text: string): string[] {
  const out: string[] = [];
  for (const line of text.split(/\r?\n/)) {
    const name = line.replace(/^\s*(?:[-*•]|\d+[.)])\s*/, '').trim();
    if (name && !out.some((n) => n.toLowerCase() === name.toLowerCase())) out.push(name);
  }
  return out.slice(0, MAX_PASTED_NAMES);
}

/**
 * Finds each pasted name with the catalogue's typo-tolerant search and keeps its best match.
 * Names with no match come back with `match: null`, so the page can list them in words.
 */
export function useNameResolver() {
  const queryClient = useQueryClient();
  const { t } = useTranslation('cards');
  const [state, setState] = useState<ResolveState>({ status: 'idle' });

  const resolve = useCallback(
    async (names: string[]): Promise<ResolvedName[] | null> => {
      setState({ status: 'working', total: names.length });
      try {
        const results = await Promise.all(
          names.map(async (typed) => {
            const page = await queryClient.fetchQuery(
              speciesListQueryOptions({ q: typed, pageSize: 1, sort: 'relevance' }),
            );
            return { typed, match: page.items[0] ?? null };
          }),
        );
        setState({ status: 'done', results });
        return results;
      } catch (error) {
        setState({ status: 'failed', message: error instanceof Error ? error.message : t('choose.searchFailed') });
        return null;
      }
    },
    [queryClient, t],
  );

  return { state, resolve, reset: () => setState({ status: 'idle' }) };
}
