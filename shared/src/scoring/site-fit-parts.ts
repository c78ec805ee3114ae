import type { ScorePart } from '../types/recommendation.js';
import { type Site, type RegionContext } from '../types/site.js';
import { MOISTURE_LEVELS, SUN_LEVELS, type Habitat, type Species, type WetlandIndicator } from '../types/species.js';
import { MOISTURE_WORDS, SUN_WORDS } from '../vocabulary/site-words.js';
import { factsOf } from './species-facts.js';
import { ecoregionsOf, needsAcidSoil, wetlandIndicatorOf } from './species-traits.js';
import { sharedPart, PartCache } from './word-cache.js';

/**
 * Graded site fit: the hard checks only say a species can grow here; these parts tell where it
 * thrives from what it merely tolerates, so a wetland plant leads on a wet site and a dry-prairie
 * plant on a dry one. Points are Homeground's own.
 */
export const FIT_POINTS = {
  /** The site's level is in the species' optimum (the whole range when the record has no optimum). */
  optimum: 2,
  /** The species' range stops short of the opposite end (a wet-site plant that takes no dry soil). */
  specialist: 1.5,
  /** A woodland plant (takes shade) on a full-sun site, or a sun plant in shade: it copes, no more. */
  offEnd: -1,
} as const;

/** Wetland indicator points by site moisture (National Wetland Plant List classes; Homeground's weights). */
const WETLAND_POINTS: Record<Site['moisture'], Record<WetlandIndicator, number>> = {
  wet: { OBL: 2, FACW: 1.5, FAC: 0.5, FACU: -1, UPL: -2 },
  medium: { OBL: -1, FACW: 0, FAC: 0.5, FACU: 0.5, UPL: 0 },
  dry: { OBL: -2, FACW: -1.5, FAC: 0, FACU: 0.5, UPL: 1 },
};

const WETLAND_WORDS: Record<WetlandIndicator, string> = {
  OBL: 'almost always found in wetlands',
  FACW: 'usually found in wetlands',
  FAC: 'found in wetlands and uplands alike',
  FACU: 'usually found in uplands',
  UPL: 'almost never found in wetlands',
};

const thriveParts = new PartCache<number>();
const FULL_AT = SUN_LEVELS.indexOf('full');
const SHADE_AT = SUN_LEVELS.indexOf('shade');
const FULL = 1 << FULL_AT;
const SHADE = 1 << SHADE_AT;
const DRY = 1 << MOISTURE_LEVELS.indexOf('dry');
const WET = 1 << MOISTURE_LEVELS.indexOf('wet');

/** How well the sun and moisture suit the species, as one "thrives" part (or null when it only copes). */
export function thrivesPart(species: Species, site: Site, facts = factsOf(species)): ScorePart | null {
  // Bits of the facts, not the record's lists: this runs for every candidate on every request.
  const sunAt = SUN_LEVELS.indexOf(site.sun);
  const moistureAt = MOISTURE_LEVELS.indexOf(site.moisture);
  const sunBest = (facts.sunOptimumBits & (1 << sunAt)) !== 0;
  const moistBest = (facts.moistureOptimumBits & (1 << moistureAt)) !== 0;
  let points = (sunBest ? FIT_POINTS.optimum : 0) + (moistBest ? FIT_POINTS.optimum : 0);
  if (
    (site.moisture === 'wet' && (facts.moistureBits & DRY) === 0) ||
    (site.moisture === 'dry' && (facts.moistureBits & WET) === 0)
  ) {
    points += FIT_POINTS.specialist;
  }
  if (
    (site.sun === 'full' && (facts.sunBits & SHADE) === 0) ||
    (site.sun === 'shade' && (facts.sunBits & FULL) === 0)
  ) {
    points += FIT_POINTS.specialist;
  }
  if ((site.sun === 'full' && facts.firstSun === SHADE_AT) || (site.sun === 'shade' && facts.firstSun === FULL_AT))
    points += FIT_POINTS.offEnd;
  if (points <= 0) return null;
  // A number naming points, which optimum matched, and the ground: no string per species.
  const key = ((points * 4 + (sunBest ? 2 : 0) + (moistBest ? 1 : 0)) * 3 + sunAt) * 3 + moistureAt;
  const cached = thriveParts.get(key);
  if (cached !== undefined) return cached;
  const sunWords = SUN_WORDS[site.sun];
  const soilWords = `${MOISTURE_WORDS[site.moisture]} soil`;
  const reason =
    sunBest && moistBest
      ? `Thrives in ${soilWords} and ${sunWords}, as on your ground.`
      : sunBest || moistBest
        ? `Does best in ${sunBest ? sunWords : soilWords}, as on your ground.`
        : 'A plant of ground like yours.';
  return thriveParts.keep(key, { name: 'thrives', points, reason });
}

const wetlandParts = new PartCache<string>();
const communityParts = new PartCache<string>();

export function wetlandPart(species: Species, site: Site): ScorePart | null {
  const indicator = wetlandIndicatorOf(species);
  if (indicator === null) return null;
  const points = WETLAND_POINTS[site.moisture][indicator];
  if (points === 0) return null;
  const key = `${site.moisture}${indicator}`;
  return (
    wetlandParts.get(key) ??
    wetlandParts.keep(key, {
      name: 'wetland-class',
      points,
      reason: `In the wild it is ${WETLAND_WORDS[indicator]} (National Wetland Plant List).`,
    })
  );
}

export function acidSoilPart(species: Species): ScorePart | null {
  if (!needsAcidSoil(species)) return null;
  return {
    name: 'acid-soil',
    points: -2,
    reason: 'Needs acid soil: test yours first, as many yard soils are near neutral.',
  };
}

/** Ferns belong in shade mixes (common practice): they fill the ground under trees where few flowers bloom. */
export function fernPart(species: Species, site: Site): ScorePart | null {
  if (species.growthForm !== 'fern' || site.sun === 'full') return null;
  return {
    name: 'fern',
    points: site.sun === 'shade' ? 2.5 : 1,
    reason: 'A fern to fill the shade between the flowers.',
  };
}

/**
 * The natural communities that mark a plant of dry, wet or shaded ground (Homeground's grouping of
 * the catalogue's habitat words): a species of glades and sand prairies leads on a dry site, one of
 * marshes and wet prairies on a wet site, one of forests in shade.
 */
const DRY_COMMUNITIES: ReadonlySet<Habitat> = new Set([
  'sand-prairie',
  'glade',
  'rock-outcrop',
  'shortgrass-prairie',
  'mixed-grass-prairie',
  'dune',
  'pine-barrens',
]);
const WET_COMMUNITIES: ReadonlySet<Habitat> = new Set(['marsh', 'wetland', 'fen-bog', 'wet-prairie', 'streambank']);
const SHADE_COMMUNITIES: ReadonlySet<Habitat> = new Set(['forest', 'floodplain-forest']);

const COMMUNITY_WORDS = {
  dry: 'A plant of dry prairies, glades and sands, at home on dry ground like yours.',
  wet: 'A plant of marshes, wet prairies and streambanks, at home in wet ground like yours.',
  shade: 'A woodland plant, at home in shade like yours.',
} as const;

export function communityPart(species: Species, site: Site): ScorePart | null {
  const kind =
    site.moisture === 'dry' ? 'dry' : site.moisture === 'wet' ? 'wet' : site.sun === 'shade' ? 'shade' : null;
  if (kind === null) return null;
  const set = kind === 'dry' ? DRY_COMMUNITIES : kind === 'wet' ? WET_COMMUNITIES : SHADE_COMMUNITIES;
  if (!species.habitats.some((h) => set.has(h))) return null;
  return (
    communityParts.get(kind) ??
    communityParts.keep(kind, { name: 'community', points: 1.5, reason: COMMUNITY_WORDS[kind] })
  );
}

/**
 * A species native to few ecoregions, yours among them, is characteristic of your part of the
 * country; a plant found from Maine to Texas is not. This is what lets the ecoregion change the
 * answer between regions whose woodland plants otherwise overlap (Homeground's rule: 30 ecoregions
 * is about the narrowest quarter of the catalogue's ranges, whose median is 40).
 */
export const REGIONAL_MAX_ECOREGIONS = 30;
const REGIONAL_PART = sharedPart({
  name: 'ecoregion',
  points: 0.75,
  reason: 'Characteristic of your region: native to only a few ecoregions, yours among them.',
});

export function regionalPart(species: Species, region: RegionContext): ScorePart | null {
  const code = region.ecoregionCode;
  const list = ecoregionsOf(species);
  if (code === undefined || list === undefined || list.length > REGIONAL_MAX_ECOREGIONS || !list.includes(code))
    return null;
  // A narrow range that only grazes the region (a shortgrass plant at the edge of the Driftless
  // Area) is not characteristic of it: the species must also belong to the region's plant communities.
  const communities = region.ecoregionPlantCommunities;
  if (communities && !species.habitats.some((h) => communities.includes(h))) return null;
  return REGIONAL_PART;
}
