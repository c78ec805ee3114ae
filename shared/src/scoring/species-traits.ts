import type { CommercialAvailability, Moisture, Species, StateCode, Sun, WetlandIndicator } from '../types/species.js';
import { genusOf } from './genus.js';

/**
 * Facts the catalogue is gaining (ecoregions, optimum sun and moisture, wetland indicator, acid
 * soil, self-sowing, commercial availability, legal protection). Until every record has them the
 * engine reads them through these helpers, which fall back as agreed: no ecoregions → state
 * nativity; no optimum → the whole range; the rest → unknown (no points either way).
 */

interface GradedFacts {
  ecoregions?: readonly string[];
  sunOptimum?: readonly Sun[];
  moistureOptimum?: readonly Moisture[];
  wetlandIndicator?: WetlandIndicator | null;
  needsAcidSoil?: boolean;
  selfSows?: boolean;
  commercialAvailability?: CommercialAvailability | null;
  protectedIn?: readonly StateCode[];
}

/** A record that may carry the graded facts (they are optional until the catalogue is filled). */
export type GradedSpecies = Species & GradedFacts;

const facts = (s: Species) => s as GradedSpecies;

/** EPA Level III codes where the species is native, or undefined when the record does not say. */
export function ecoregionsOf(s: Species): readonly string[] | undefined {
  const e = facts(s).ecoregions;
  return e && e.length > 0 ? e : undefined;
}

export function sunOptimumOf(s: Species): readonly Sun[] {
  const o = facts(s).sunOptimum;
  return o && o.length > 0 ? o : s.sun;
}

export function moistureOptimumOf(s: Species): readonly Moisture[] {
  const o = facts(s).moistureOptimum;
  return o && o.length > 0 ? o : s.moisture;
}

export function wetlandIndicatorOf(s: Species): WetlandIndicator | null {
  return facts(s).wetlandIndicator ?? null;
}

export function needsAcidSoil(s: Species): boolean {
  return facts(s).needsAcidSoil === true;
}

export function commercialAvailabilityOf(s: Species): CommercialAvailability | null {
  return facts(s).commercialAvailability ?? null;
}

/**
 * Heavy self-sowers. Until records carry `selfSows`, a short rule table of genera that gardeners
 * know for seeding about a small bed (Homeground's table, common practice, from memory).
 */
const SELF_SOWING_GENERA: ReadonlySet<string> = new Set([
  'Impatiens',
  'Viola',
  'Rudbeckia',
  'Oenothera',
  'Erigeron',
  'Aquilegia',
  'Chamaecrista',
  'Helianthus',
  'Verbena',
  'Penstemon',
  'Lobelia',
  'Senna',
]);
const SELF_SOWING_SPECIES: ReadonlySet<string> = new Set([
  'Rudbeckia hirta',
  'Rudbeckia triloba',
  'Oenothera biennis',
  'Impatiens capensis',
  'Impatiens pallida',
  'Erigeron annuus',
  'Erigeron philadelphicus',
  'Chamaecrista fasciculata',
  'Helianthus annuus',
  'Verbena urticifolia',
  'Viola sororia',
  'Viola pubescens',
  'Senna hebecarpa',
  'Senna marilandica',
  'Aquilegia canadensis',
  'Hackelia virginiana',
  'Agastache scrophulariifolia',
  'Geum canadense',
  'Campanulastrum americanum',
]);

export function selfSows(s: Species): boolean {
  const f = facts(s).selfSows;
  if (f !== undefined) return f;
  // The species table only: the genus table is a hint for curators, too broad to exclude on.
  return (
    SELF_SOWING_SPECIES.has(s.scientificName) || (s.lifespan !== 'perennial' && SELF_SOWING_GENERA.has(genusOf(s)))
  );
}

/** States where the species is legally protected, when the record says. */
export function protectedInOf(s: Species): readonly StateCode[] | undefined {
  return facts(s).protectedIn;
}
