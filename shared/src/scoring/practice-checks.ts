import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { formatArea } from '../units/format-units.js';
import { SMALL_BED_SQ_FT, woodyShare } from './layers.js';
import type { CheckResult } from './hard-checks.js';
import { factsOf, listsEcoregion } from './species-facts.js';

/**
 * Checks of garden practice and place that decide whether a species goes in a yard mix: the layer
 * (woody plants only on request and only where one fits), lifespan (annuals and biennials are not
 * counted into a perennial mix), manners in a small bed, and the ecoregion. Each gives a verdict a
 * cheap twin (the `…Fails` functions) repeats without words for hard-check-outcome.ts.
 */

export type PracticeVerdict = 'pass' | 'near-miss' | 'out';

export function layerVerdict(species: Species, site: Site, facts = factsOf(species)): PracticeVerdict {
  if (!facts.structural) return 'pass';
  if (!site.woodyPlants) return 'out';
  const room = woodyShare(site.areaSqFt) * site.areaSqFt;
  const one = facts.footprintSqFt;
  // Wider than the whole bed is checkRoom's failure; one failure, one reason.
  if (one <= room || one > site.areaSqFt) return 'pass';
  return 'near-miss';
}

export function checkLayer(species: Species, site: Site, facts = factsOf(species)): CheckResult {
  const v = layerVerdict(species, site, facts);
  if (v === 'pass') return null;
  if (!site.woodyPlants) {
    return {
      failure: 'A shrub, tree or vine: ask for shrubs and small trees to include woody plants.',
      nearMiss: false,
    };
  }
  const room = woodyShare(site.areaSqFt) * site.areaSqFt;
  return {
    failure: `Grows about ${formatArea(facts.footprintSqFt)} across at maturity, more than the ${formatArea(room)} your bed has for woody plants.`,
    nearMiss: v === 'near-miss',
  };
}

export function lifespanFails(species: Species, facts = factsOf(species)): boolean {
  return facts.shortLived;
}

export function checkLifespan(species: Species, facts = factsOf(species)): CheckResult {
  if (!facts.shortLived) return null;
  const kind =
    species.lifespan === 'annual'
      ? 'An annual: it lives one season'
      : 'A biennial: it flowers in its second year, then dies';
  return {
    failure: `${kind} and comes back only from seed, so it is not counted as a plant of the mix; sow it among the perennials.`,
    nearMiss: true,
  };
}

export function spreaderFails(species: Species, site: Site, facts = factsOf(species)): boolean {
  // Annuals and biennials self-sow by nature; the lifespan check already sets them apart.
  if (site.spreaders || site.areaSqFt >= SMALL_BED_SQ_FT) return false;
  return !facts.shortLived && facts.unruly;
}

export function checkSpreader(species: Species, site: Site, facts = factsOf(species)): CheckResult {
  if (!spreaderFails(species, site, facts)) return null;
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
export function ecoregionFails(species: Species, region: RegionContext, facts = factsOf(species)): boolean {
  const code = region.ecoregionCode;
  if (code === undefined) return false;
  return listsEcoregion(facts, code) === false;
}

export function checkEcoregion(species: Species, region: RegionContext, facts = factsOf(species)): CheckResult {
  if (!ecoregionFails(species, region, facts)) return null;
  return {
    failure: `Native to the state, but not to your ecoregion (EPA Level III ${region.ecoregionCode}).`,
    nearMiss: false,
  };
}
