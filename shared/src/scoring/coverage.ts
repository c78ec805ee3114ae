import type { Coverage } from '../types/recommendation.js';
import type { RegionContext } from '../types/site.js';
import type { Species, StateCode } from '../types/species.js';
import { ecoregionsOf } from './species-traits.js';

/**
 * Which regions the catalogue really covers. It holds native plants of the eastern and central US;
 * for the West it would only offer eastern plants that happen to reach a western state, so there
 * Homeground says plainly that it does not cover the region instead of recommending.
 *
 * Once most records list their ecoregions, coverage is read from the data: an ecoregion is covered
 * when at least MIN_SPECIES_FOR_COVERAGE species are native to it, enough for a mix in most sun and
 * moisture. Until then, a rule table: EPA Level III ecoregions of the Great Plains eastward
 * (25–40, 42–76, 82–84), which is the catalogue's scope; the Rockies, deserts and Pacific regions
 * (1–24, 41, 77–81, 85) are not covered.
 */
export const MIN_SPECIES_FOR_COVERAGE = 40;

const WESTERN_ECOREGIONS: ReadonlySet<string> = new Set([
  ...Array.from({ length: 24 }, (_, i) => String(i + 1)),
  '41',
  '77',
  '78',
  '79',
  '80',
  '81',
  '85',
]);

/** States that lie wholly in the uncovered West (used when only the state is known). */
const WESTERN_STATES: ReadonlySet<StateCode> = new Set(['AZ', 'CA', 'ID', 'NV', 'OR', 'UT', 'WA']);

/**
 * Counts per catalogue: the API passes the same array on every request until the catalogue
 * changes, and counting 30,000 records' ecoregions was a good part of a request's time.
 */
const countsByCatalogue = new WeakMap<readonly Species[], Map<string, number> | null>();

/** Species counts per ecoregion code, when most records carry ecoregions; otherwise null. */
export function speciesPerEcoregion(species: readonly Species[]): Map<string, number> | null {
  if (countsByCatalogue.has(species)) return countsByCatalogue.get(species) ?? null;
  const counts = countEcoregions(species);
  countsByCatalogue.set(species, counts);
  return counts;
}

function countEcoregions(species: readonly Species[]): Map<string, number> | null {
  const counts = new Map<string, number>();
  let withData = 0;
  for (const s of species) {
    const list = ecoregionsOf(s);
    if (!list) continue;
    withData++;
    for (const code of list) counts.set(code, (counts.get(code) ?? 0) + 1);
  }
  return withData * 2 >= species.length && withData > 0 ? counts : null;
}

function notCovered(where: string): Coverage {
  return {
    covered: false,
    message:
      `Homeground's catalogue holds native plants of the eastern and central United States and does not cover ${where} yet, ` +
      'so it does not recommend plants there: eastern plants would be the wrong choice. A native-plant society or extension office near you can help.',
  };
}

export function catalogueCoverage(
  species: readonly Species[],
  region: RegionContext,
  counts = speciesPerEcoregion(species),
): Coverage {
  const code = region.ecoregionCode;
  if (code !== undefined) {
    // A small catalogue (a test's, a curator's draft) needs half its species there, not 40.
    const needed = Math.min(MIN_SPECIES_FOR_COVERAGE, Math.ceil(species.length / 2));
    const covered = counts ? (counts.get(code) ?? 0) >= needed : !WESTERN_ECOREGIONS.has(code);
    return covered ? { covered: true } : notCovered(`your ecoregion (EPA Level III ${code})`);
  }
  return WESTERN_STATES.has(region.state) ? notCovered('your state') : { covered: true };
}

/** The ecoregion codes the catalogue covers, for the home page count. */
export function coveredEcoregionCodes(species: readonly Species[], allCodes: readonly string[]): string[] {
  const counts = speciesPerEcoregion(species);
  return allCodes.filter((code) => catalogueCoverage(species, { state: 'WI', ecoregionCode: code }, counts).covered);
}
