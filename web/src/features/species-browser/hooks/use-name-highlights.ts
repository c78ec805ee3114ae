import type { SpeciesSummary } from '@homeground/shared';
import type { RangeTuple } from 'fuse.js';
import { useEffect, useMemo, useState } from 'react';

type FuseClass = typeof import('fuse.js').default;

export interface NameHighlights {
  commonName: RangeTuple[];
  scientificName: RangeTuple[];
}

/** Fuse's ranges are inclusive [start, end]; shorter runs than this are noise, not a match. */
const MIN_RUN = 3;

function mergeRanges(ranges: RangeTuple[]): RangeTuple[] {
  const sorted = ranges.filter(([a, b]) => b - a + 1 >= MIN_RUN).sort((x, y) => x[0] - y[0]);
  const out: RangeTuple[] = [];
  for (const [a, b] of sorted) {
    const last = out[out.length - 1];
    // A one-letter gap is the typo itself ("buterfly" against "butterfly"): mark the word whole.
    if (last && a <= last[1] + 2) last[1] = Math.max(last[1], b);
    else out.push([a, b]);
  }
  return out;
}

/**
 * Where each word of a search falls in the names on screen, typos and all ("buterfly" marks
 * "butterfly"). The API has already chosen and ranked the rows; this only draws the highlight.
 * fuse.js loads on the first search, so it never weighs on the first page load.
 */
export function useNameHighlights(items: readonly SpeciesSummary[], query: string): Map<string, NameHighlights> {
  const [Fuse, setFuse] = useState<FuseClass | null>(null);
  const words = useMemo(
    () =>
      query
        .trim()
        .split(/\s+/)
        .filter((w) => w.length >= MIN_RUN),
    [query],
  );

  useEffect(() => {
    if (Fuse || words.length === 0) return;
    let isCurrent = true;
    void import('fuse.js').then((m) => {
      if (isCurrent) setFuse(() => m.default);
    });
    return () => {
      isCurrent = false;
    };
  }, [Fuse, words.length]);

  return useMemo(() => {
    const found = new Map<string, NameHighlights>();
    if (!Fuse || words.length === 0) return found;
    const fuse = new Fuse(items as SpeciesSummary[], {
      keys: ['commonName', 'scientificName'],
      includeMatches: true,
      ignoreLocation: true,
      threshold: 0.4,
      minMatchCharLength: MIN_RUN,
    });
    for (const word of words) {
      for (const result of fuse.search(word)) {
        const entry = found.get(result.item.slug) ?? { commonName: [], scientificName: [] };
        for (const match of result.matches ?? []) {
          if (match.key === 'commonName' || match.key === 'scientificName') entry[match.key].push(...match.indices);
        }
        found.set(result.item.slug, entry);
      }
    }
    for (const entry of found.values()) {
      entry.commonName = mergeRanges(entry.commonName);
      entry.scientificName = mergeRanges(entry.scientificName);
    }
    return found;
  }, [Fuse, items, words]);
}
