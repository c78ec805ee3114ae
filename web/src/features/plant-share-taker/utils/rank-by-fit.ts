import type { ShareSpecies } from '@homeground/shared';

export interface RankedGroup {
  /** `all` before the taker describes their yard; then `fits` (best first) and `less-suited`. */
  group: 'all' | 'fits' | 'less-suited';
  species: ShareSpecies[];
}

/**
 * The species on offer in the engine's order for the taker's yard (the API's `fit.rank`); those that
 * only nearly suit, or do not, follow under their own heading, so nothing on offer disappears.
 */
export function rankByFit(species: readonly ShareSpecies[]): RankedGroup[] {
  if (species.every((s) => s.fit === null)) return [{ group: 'all', species: [...species] }];
  const ranked = [...species].sort((a, b) => (a.fit?.rank ?? Infinity) - (b.fit?.rank ?? Infinity));
  const suits = (s: ShareSpecies) => s.fit?.fit === 'thrives' || s.fit?.fit === 'grows';
  return [
    { group: 'fits' as const, species: ranked.filter(suits) },
    { group: 'less-suited' as const, species: ranked.filter((s) => !suits(s)) },
  ].filter((g) => g.species.length > 0);
}

/** The wildlife value's parts that have words, in the order caterpillars, bees, monarchs, birds. */
export function wildlifeLines(wildlife: ShareSpecies['wildlife']): string[] {
  return [wildlife.caterpillars, wildlife.bees, wildlife.monarchs, wildlife.birds].filter(
    (w): w is string => typeof w === 'string' && w.length > 0,
  );
}
