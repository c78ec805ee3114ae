import type { Species } from '../types/species.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import { mixWordsFor } from './mix-words.js';

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
export function keptProtectedNotice(species: Species, locale: WordLocale = 'en'): string {
  return mixWordsFor(locale).keptProtected(species.commonNames[0]);
}

/** Names listed in the notice below; a big catalogue could otherwise make it a page long. */
const NAMED = 3;

/** The notice for protected species that suit the ground but were left out of the automatic mix (best first). */
export function withheldProtectedNotice(species: readonly Species[], locale: WordLocale = 'en'): string {
  const named = species.slice(0, NAMED).map((s) => s.commonNames[0]);
  const more = species.length - named.length;
  // With more to come the three are a list's head ("A, B, C and 4 others"): commas only.
  const names = more > 0 ? named.join(', ') : wordsFor(locale).join(named);
  return mixWordsFor(locale).withheldProtected(species.length, names, more);
}
