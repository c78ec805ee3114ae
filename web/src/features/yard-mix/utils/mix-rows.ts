import type { ChosenSpecies, MixQuantity, MixResponse, ScorePart, SpeciesSummary } from '@homeground/shared';

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
