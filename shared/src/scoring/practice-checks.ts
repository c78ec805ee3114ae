import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { formatArea } from '../units/format-units.js';
import { SMALL_BED_SQ_FT, isStructural, matureFootprintSqFt, woodyShare } from './layers.js';
import type { CheckResult } from './hard-checks.js';
import { ecoregionsOf, selfSows } from './species-traits.js';

/**
 * Checks of garden practice and place that decide whether a species goes in a yard mix: the layer
 * (woody plants only on request and only where one fits), lifespan (annuals and biennials are not
 * counted into a perennial mix), manners in a small bed, and the ecoregion. Each gives a verdict a
 * cheap twin (the `…Fails` functions) repeats without words for hard-check-outcome.ts.
 */

export type PracticeVerdict = 'pass' | 'near-miss' | 'out';

export function layerVerdict(species: Species, site: Site): PracticeVerdict {
  if (!isStructural(species)) return 'pass';
  if (!site.woodyPlants) return 'out';
  const room = woodyShare(site.areaSqFt) * site.areaSqFt;
  const one = matureFootprintSqFt(species);
  // Wider than the whole bed is checkRoom's failure; one failure, one reason.
  if (one <= room || one > site.areaSqFt) return 'pass';
  return 'near-miss';
}

export function checkLayer(species: Species, site: Site): CheckResult {
  const v = layerVerdict(species, site);
  if (v === 'pass') return null;
  if (!site.woodyPlants) {
    return {
      failure: 'A shrub, tree or vine: ask for shrubs and small trees to include woody plants.',
      nearMiss: false,
    };
  }
  const room = woodyShare(site.areaSqFt) * site.areaSqFt;
  return {
    failure: `Grows about ${formatArea(matureFootprintSqFt(species))} across at maturity, more than the ${formatArea(room)} your bed has for woody plants.`,
    nearMiss: v === 'near-miss',
  };
}

export function lifespanFails(species: Species): boolean {
  return species.lifespan === 'annual' || species.lifespan === 'biennial';
}

export function checkLifespan(species: Species): CheckResult {
  if (!lifespanFails(species)) return null;
  const kind =
    species.lifespan === 'annual'
      ? 'An annual: it lives one season'
      : 'A biennial: it flowers in its second year, then dies';
  return {
    failure: `${kind} and comes back only from seed, so it is not counted as a plant of the mix; sow it among the perennials.`,
    nearMiss: true,
  };
}

export function spreaderFails(species: Species, site: Site): boolean {
  // Annuals and biennials self-sow by nature; the lifespan check already sets them apart.
  if (site.spreaders || site.areaSqFt >= SMALL_BED_SQ_FT || lifespanFails(species)) return false;
  return species.spreadHabit === 'aggressive' || selfSows(species);
}

export function checkSpreader(species: Species, site: Site): CheckResult {
  if (!spreaderFails(species, site)) return null;
  const how = species.spreadHabit === 'aggressive' ? 'Spreads hard by roots or seed' : 'Seeds itself about freely';
  return {
    failure: `${how} and would take over a bed under ${formatArea(SMALL_BED_SQ_FT)}; ask for spreaders to include it.`,
    nearMiss: true,
  };
}

/**
 * Ecoregion: when the record lists its EPA Level III ecoregions and the site's is known, a species
 * native to the state but absent from that part of it is out. Otherwise state nativity decides
 * (checkNative).
 */
export function ecoregionFails(species: Species, region: RegionContext): boolean {
  const code = region.ecoregionCode;
  const list = ecoregionsOf(species);
  return code !== undefined && list !== undefined && !list.includes(code);
}

export function checkEcoregion(species: Species, region: RegionContext): CheckResult {
  if (!ecoregionFails(species, region)) return null;
  return {
    failure: `Native to the state, but not to your ecoregion (EPA Level III ${region.ecoregionCode}).`,
    nearMiss: false,
  };
}
