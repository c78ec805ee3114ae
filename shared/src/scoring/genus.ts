import type { Species } from '../types/species.js';

/** The genus is the first word of the accepted name; caterpillar host counts are per genus. */
export function genusOf(species: Pick<Species, 'scientificName'>): string {
  // indexOf + slice, not split: this runs for every candidate of every mix.
  const name = species.scientificName;
  const space = name.indexOf(' ');
  return space < 0 ? name : name.slice(0, space);
}

/**
 * Native milkweed for the NRCS monarch rule (E327136Z2: at least one native Asclepias species).
 * Callers only pass species already native to the state. A. curassavica is never native in the
 * conterminous US and is refused by name as the enhancement prohibits it (E327, CHECK-VALUES §3, R).
 */
export function isNativeMilkweed(species: Pick<Species, 'scientificName'>): boolean {
  return genusOf(species) === 'Asclepias' && species.scientificName !== 'Asclepias curassavica';
}
