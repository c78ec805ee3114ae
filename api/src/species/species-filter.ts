import {
  belongsToEcoregion,
  compareWildlifeValue,
  type Ecoregion,
  type Species,
  type SpeciesQuery,
} from '@homeground/shared';

/** Applies every filter of `GET /api/species` except the text search. */
export function matchesFilters(s: Species, q: SpeciesQuery, ecoregion: Ecoregion | undefined): boolean {
  if (q.state && !s.nativeStates.includes(q.state)) return false;
  if (ecoregion && !belongsToEcoregion(s, ecoregion)) return false;
  if (q.sun && !s.sun.includes(q.sun)) return false;
  if (q.moisture && !s.moisture.includes(q.moisture)) return false;
  if (q.bloomMonth && !s.bloomMonths.includes(q.bloomMonth)) return false;
  if (q.growthForm && s.growthForm !== q.growthForm) return false;
  // Height filters compare the species' usual range with the asked one: it must fit below a maximum
  // and reach a minimum.
  if (q.maxHeightCm !== undefined && s.heightCm.min > q.maxHeightCm) return false;
  if (q.minHeightCm !== undefined && s.heightCm.max < q.minHeightCm) return false;
  if (q.monarchHost !== undefined && s.wildlife.monarchHost !== q.monarchHost) return false;
  return true;
}

const byName = (a: Species, b: Species) =>
  a.commonNames[0].localeCompare(b.commonNames[0]) || a.slug.localeCompare(b.slug);

const COMPARATORS: Record<
  Exclude<NonNullable<SpeciesQuery['sort']>, 'relevance'>,
  (a: Species, b: Species) => number
> = {
  name: byName,
  scientificName: (a, b) => a.scientificName.localeCompare(b.scientificName),
  height: (a, b) => a.heightCm.max - b.heightCm.max || byName(a, b),
  bloomStart: (a, b) => Math.min(...a.bloomMonths, 13) - Math.min(...b.bloomMonths, 13) || byName(a, b),
  // Homeground's several-part wildlife value (compareWildlifeValue), never one host count.
  hostValue: (a, b) => compareWildlifeValue(a, b) || byName(a, b),
};

/** Sorts in place; `relevance` keeps the search order (or falls back to name without a search). */
export function sortSpecies(
  list: Species[],
  sort: SpeciesQuery['sort'],
  order: SpeciesQuery['order'],
  hasSearch: boolean,
): Species[] {
  const key = sort ?? (hasSearch ? 'relevance' : 'name');
  if (key === 'relevance')
    return hasSearch ? (order === 'desc' ? list.reverse() : list) : sortSpecies(list, 'name', order, false);
  // Most wildlife value first still lists equals by name, A to Z.
  if (key === 'hostValue' && order === 'desc') return list.sort((a, b) => compareWildlifeValue(b, a) || byName(a, b));
  const cmp = COMPARATORS[key];
  return list.sort(order === 'desc' ? (a, b) => cmp(b, a) : cmp);
}
