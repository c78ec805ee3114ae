import type { ChosenSpecies, MixQuantity, MixResponse, ScorePart, SpeciesSummary } from '@homeground/shared';
import { MONTH_NAMES } from './bloom-gaps.js';

/** One species of the mix with everything a row or card shows. */
export interface MixRow {
  slug: string;
  species: SpeciesSummary;
  chosen: ChosenSpecies;
  quantity: MixQuantity | undefined;
  isLocked: boolean;
  isExcluded: boolean;
}

export function mixRows(mix: MixResponse, locked: readonly string[], excluded: readonly string[]): MixRow[] {
  const quantities = new Map(mix.quantities.map((q) => [q.slug, q]));
  return mix.palette.chosen
    .filter((c) => mix.species[c.slug])
    .map((c) => ({
      slug: c.slug,
      species: mix.species[c.slug],
      chosen: c,
      quantity: quantities.get(c.slug),
      isLocked: locked.includes(c.slug),
      isExcluded: excluded.includes(c.slug),
    }));
}

/** "why it fits": the parts' sentences, strongest reasons first, and the cautions of the score apart. */
export function whyItFits(parts: readonly ScorePart[]): { fits: string[]; mindful: string[] } {
  const sorted = [...parts].sort((a, b) => b.points - a.points);
  return {
    fits: sorted.filter((p) => p.points >= 0).map((p) => p.reason),
    mindful: sorted.filter((p) => p.points < 0).map((p) => p.reason),
  };
}

/** Bloom months as words: "May to July", "June and September", "no flowers recorded". */
export function bloomWords(months: readonly number[]): string {
  if (months.length === 0) return 'no flowers recorded';
  const sorted = [...months].sort((a, b) => a - b);
  const runs: number[][] = [];
  for (const m of sorted) {
    const last = runs[runs.length - 1];
    if (last && last[last.length - 1] === m - 1) last.push(m);
    else runs.push([m]);
  }
  const name = (m: number) => MONTH_NAMES[m - 1];
  const parts = runs.map((r) => (r.length === 1 ? name(r[0]) : `${name(r[0])} to ${name(r[r.length - 1])}`));
  return parts.length === 1 ? parts[0] : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
}
