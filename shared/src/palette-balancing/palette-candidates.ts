import type { PaletteOptions, Recommendation, ScoredSpecies } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { compareScored, recommend, scoreSpecies } from '../scoring/score-species.js';
import { toPaletteItem, type PaletteItem } from './palette-item.js';

export interface PaletteInput {
  species: readonly Species[];
  site: Site;
  region: RegionContext;
  options?: PaletteOptions;
}

export interface PaletteCandidates {
  recommendation: Recommendation;
  /** Eligible species (plus locked natives that just miss), not excluded. */
  items: PaletteItem[];
  scored: Map<string, ScoredSpecies>;
  species: Map<string, Species>;
  locked: string[];
  excluded: string[];
  notices: string[];
}

/**
 * The candidates a mix is chosen from. A lock on a native species that misses the site by a step
 * is honoured (the user knows their ground), with a notice; a lock on a species not native to the
 * state is refused, because Homeground only ever recommends natives. Exclusion wins over a lock.
 */
export function buildCandidates(input: PaletteInput): PaletteCandidates {
  const { site, region } = input;
  const excluded = [...new Set(input.options?.excluded ?? [])].sort();
  const excludedSet = new Set(excluded);
  const species = new Map(input.species.map((s) => [s.slug, s]));
  const recommendation = recommend([...species.values()], site, region);
  const notices: string[] = [];
  const pool: ScoredSpecies[] = recommendation.ranked.filter((r) => !excludedSet.has(r.slug));
  const locked: string[] = [];

  for (const slug of [...new Set(input.options?.locked ?? [])].sort()) {
    const s = species.get(slug);
    if (excludedSet.has(slug)) {
      notices.push(`${s?.commonNames[0] ?? slug} is both kept and left out; it stays out.`);
    } else if (!s) {
      notices.push(`${slug} is not in the catalogue, so it cannot be kept in the mix.`);
    } else if (!s.nativeStates.includes(region.state)) {
      notices.push(`${s.commonNames[0]} is not native to your state, so it cannot be in the mix.`);
    } else {
      locked.push(slug);
      if (!pool.some((r) => r.slug === slug)) {
        const scored = scoreSpecies(s, site, region);
        notices.push(`You kept ${s.commonNames[0]} in the mix, though it is a poor fit: ${scored.ineligibleReason}`);
        pool.push(scored);
      }
    }
  }
  pool.sort(compareScored);
  return {
    recommendation,
    items: pool.map((r) => toPaletteItem(species.get(r.slug) as Species, r)),
    scored: new Map(pool.map((r) => [r.slug, r])),
    species,
    locked,
    excluded,
    notices,
  };
}
