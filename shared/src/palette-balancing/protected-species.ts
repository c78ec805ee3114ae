import type { Species } from '../types/species.js';
import { countOf } from '../scoring/plain-words.js';
import { joinWords } from '../vocabulary/join-words.js';

/**
 * A species whose record carries a `protected` caution (federally or state listed, or dug from the
 * wild for the trade, e.g. Asclepias meadii, federally threatened). Homeground never puts one in a
 * mix on its own: buying it is only right from a nursery that propagates it, which the user must
 * choose knowingly. The user may still keep one in the mix.
 */
export function isProtectedSpecies(species: Pick<Species, 'cautions'>): boolean {
  return species.cautions.some((c) => c.kind === 'protected');
}

/** The notice for a protected species the user kept in the mix. */
export function keptProtectedNotice(species: Species): string {
  return `You kept ${species.commonNames[0]}, which is protected in the wild: buy it from a nursery that propagates it, and never dig it from the wild.`;
}

/** Names listed in the notice below; a big catalogue could otherwise make it a page long. */
const NAMED = 3;

/** The notice for protected species that suit the ground but were left out of the automatic mix (best first). */
export function withheldProtectedNotice(species: readonly Species[]): string {
  const named = species.slice(0, NAMED).map((s) => s.commonNames[0]);
  const more = species.length - named.length;
  const names =
    more > 0
      ? `${named.join(', ')} and ${countOf(more, 'other protected species', 'other protected species')}`
      : joinWords(named);
  const one = species.length === 1;
  return (
    `${names} ${one ? 'suits' : 'suit'} your ground but ${one ? 'is' : 'are'} protected in the wild, so Homeground does not choose ` +
    `${one ? 'it' : 'them'} for you. To grow ${one ? 'it' : 'one'}, keep it in the mix and buy from a nursery that propagates it; never dig from the wild.`
  );
}
