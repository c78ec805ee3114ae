import type { PaletteOptions, ScoredSpecies } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { isNativeMilkweed } from '../scoring/genus.js';
import { hardCheckOutcome } from '../scoring/hard-check-outcome.js';
import { compareScored, scoreSpecies } from '../scoring/score-species.js';
import { toPaletteItem, type PaletteItem } from './palette-item.js';
import { isProtectedSpecies, keptProtectedNotice, withheldProtectedNotice } from './protected-species.js';

export interface PaletteInput {
  species: readonly Species[];
  site: Site;
  region: RegionContext;
  options?: PaletteOptions;
}

export interface PaletteCandidates {
  /** Eligible species (plus locked natives that just miss), not excluded, not protected unless locked; slug order. */
  items: PaletteItem[];
  /** The full score ("why it fits") of a candidate, by slug. */
  scoredOf: (slug: string) => ScoredSpecies | undefined;
  species: Map<string, Species>;
  /** Milkweeds native to the state that miss the site by one step, best first (for the monarch rule's words). */
  milkweedNearMisses: ScoredSpecies[];
  /** Protected species that suit the site but were left out because nobody kept them, best first. */
  withheld: Species[];
  locked: string[];
  excluded: string[];
  notices: string[];
}

const bySlug = (a: { slug: string }, b: { slug: string }) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0);

/** Binary search in a slug-sorted list. */
function findBySlug<T extends { slug: string }>(sorted: readonly T[], slug: string): T | undefined {
  let lo = 0;
  let hi = sorted.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >>> 1;
    const at = sorted[mid].slug;
    if (at === slug) return sorted[mid];
    if (at < slug) lo = mid + 1;
    else hi = mid - 1;
  }
  return undefined;
}

/**
 * The candidates a mix is chosen from. A lock on a native species that misses the site by a step
 * is honoured (the user knows their ground), with a notice; a lock on a species not native to the
 * state is refused, because Homeground only ever recommends natives. Exclusion wins over a lock.
 * A protected species is a candidate only when locked, with a notice on how to buy it.
 *
 * Only species that pass the hard checks (and native milkweeds, for the monarch rule's near
 * misses) are fully scored: the words of "why it fits" are the costly part, and a mix never shows
 * them for the rest. Each score is the one `recommend` gives the species.
 */
export function buildCandidates(input: PaletteInput): PaletteCandidates {
  const { site, region } = input;
  const excluded = [...new Set(input.options?.excluded ?? [])].sort();
  const excludedSet = new Set(excluded);
  const species = new Map<string, Species>();
  for (const s of input.species) species.set(s.slug, s);
  const lockRequests = [...new Set(input.options?.locked ?? [])].sort();
  const lockSet = new Set(lockRequests);
  const notices: string[] = [];
  const pool: ScoredSpecies[] = [];
  const withheld: ScoredSpecies[] = [];
  const milkweedNearMisses: ScoredSpecies[] = [];
  for (const s of species.values()) {
    const outcome = hardCheckOutcome(s, site, region);
    if (outcome === 'eligible') {
      if (excludedSet.has(s.slug)) continue;
      const scored = scoreSpecies(s, site, region);
      // Protected species go in a mix only when the user keeps them (see protected-species.ts).
      (isProtectedSpecies(s) && !lockSet.has(s.slug) ? withheld : pool).push(scored);
    } else if (outcome === 'near-miss' && isNativeMilkweed(s) && s.nativeStates.includes(region.state)) {
      milkweedNearMisses.push(scoreSpecies(s, site, region));
    }
  }
  const locked: string[] = [];
  for (const slug of lockRequests) {
    const s = species.get(slug);
    if (excludedSet.has(slug)) {
      notices.push(`${s?.commonNames[0] ?? slug} is both kept and left out; it stays out.`);
    } else if (!s) {
      notices.push(`${slug} is not in the catalogue, so it cannot be kept in the mix.`);
    } else if (!s.nativeStates.includes(region.state)) {
      notices.push(`${s.commonNames[0]} is not native to your state, so it cannot be in the mix.`);
    } else {
      locked.push(slug);
      if (isProtectedSpecies(s)) notices.push(keptProtectedNotice(s));
      if (hardCheckOutcome(s, site, region) !== 'eligible') {
        const scored = scoreSpecies(s, site, region);
        notices.push(`You kept ${s.commonNames[0]} in the mix, though it is a poor fit: ${scored.ineligibleReason}`);
        pool.push(scored);
      }
    }
  }
  const withheldSpecies = withheld.sort(compareScored).map((r) => species.get(r.slug) as Species);
  if (withheldSpecies.length > 0) notices.push(withheldProtectedNotice(withheldSpecies));
  // Slug order (slugs are unique here): canonical whatever the input order, what the optimiser
  // sorts by anyway (so its sort finds the list already in order), and searchable by slug.
  pool.sort(bySlug);
  return {
    items: pool.map((r) => toPaletteItem(species.get(r.slug) as Species, r)),
    scoredOf: (slug) => findBySlug(pool, slug),
    species,
    milkweedNearMisses: milkweedNearMisses.sort(compareScored),
    withheld: withheldSpecies,
    locked,
    excluded,
    notices,
  };
}
