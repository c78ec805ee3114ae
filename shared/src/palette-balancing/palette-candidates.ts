import type { PaletteOptions, ScoredSpecies } from '../types/recommendation.js';
import type { RegionContext, Site } from '../types/site.js';
import type { Species } from '../types/species.js';
import { ELIGIBLE, OUT, catalogueOutcomes } from '../scoring/catalogue-outcomes.js';
import { hardCheckOutcome } from '../scoring/hard-check-outcome.js';
import { factsOf, type SpeciesFacts } from '../scoring/species-facts.js';
import { compareScored, scorePoints, scoreSpecies, type ScorePoints } from '../scoring/score-species.js';
import { paletteItemOf, toPaletteItem, type PaletteItem } from './palette-item.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { reasonIn } from '../scoring/locale/reasons-in.js';
import { mixWordsFor } from './mix-words.js';
import { isProtectedSpecies, keptProtectedNotice, withheldProtectedNotice } from './protected-species.js';

export interface PaletteInput {
  species: readonly Species[];
  site: Site;
  region: RegionContext;
  options?: PaletteOptions;
  /** The language of the rules' details and the notices (English when absent). */
  locale?: WordLocale;
}

export interface PaletteCandidates {
  /** Eligible species (plus locked natives that just miss), not excluded, not protected unless locked; slug order. */
  items: PaletteItem[];
  /** The full score ("why it fits") of a candidate, by slug: worked out when first asked for. */
  scoredOf: (slug: string) => ScoredSpecies | undefined;
  species: ReadonlyMap<string, Species>;
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

/** A catalogue by slug (the last record of a slug wins), and its records in slug order. */
interface CatalogueIndex {
  bySlug: ReadonlyMap<string, Species>;
  inSlugOrder: readonly Species[];
  /** The facts of each record of inSlugOrder. */
  facts: readonly SpeciesFacts[];
}

/** Indexed once per catalogue: the API passes the same array on every request until it changes. */
const indexes = new WeakMap<readonly Species[], CatalogueIndex>();

function catalogueIndex(list: readonly Species[]): CatalogueIndex {
  const known = indexes.get(list);
  if (known !== undefined) return known;
  const bySlugMap = new Map<string, Species>();
  for (const s of list) bySlugMap.set(s.slug, s);
  const inSlugOrder = [...bySlugMap.values()].sort(bySlug);
  const index = { bySlug: bySlugMap, inSlugOrder, facts: inSlugOrder.map(factsOf) };
  indexes.set(list, index);
  return index;
}

/** A protected species left out, with what ranks it (compareScored's fields). */
interface Withheld {
  species: Species;
  slug: string;
  score: number;
  tieBreak: number;
}

/**
 * The candidates a mix is chosen from. A lock on a native species that misses the site by a step
 * is honoured (the user knows their ground), with a notice; a lock on a species not native to the
 * state is refused, because Homeground only ever recommends natives. Exclusion wins over a lock.
 * A protected species is a candidate only when locked, with a notice on how to buy it.
 *
 * Only species that pass the hard checks (and native milkweeds, for the monarch rule's near
 * misses) are scored, and only for their points: the words of "why it fits" are the costly part,
 * and a mix shows them for its few chosen species, so scoredOf builds them when asked. Each score
 * is the one `recommend` gives the species.
 */
export function buildCandidates(input: PaletteInput): PaletteCandidates {
  const { site, region } = input;
  const excluded = [...new Set(input.options?.excluded ?? [])].sort();
  const excludedSet = new Set(excluded);
  const { bySlug: species, inSlugOrder, facts } = catalogueIndex(input.species);
  const lockRequests = [...new Set(input.options?.locked ?? [])].sort();
  const lockSet = new Set(lockRequests);
  const notices: string[] = [];
  const locale = input.locale ?? 'en';
  const w = mixWordsFor(locale);
  const items: PaletteItem[] = [];
  const scored = new Map<string, ScoredSpecies>();
  const withheld: Withheld[] = [];
  const milkweedNearMisses: ScoredSpecies[] = [];
  const points: ScorePoints = { score: 0, tieBreak: 0, hostPoints: 0 };
  const NO_CONTEXT = {};
  const outcomes = catalogueOutcomes(inSlugOrder, site, region);
  for (let i = 0; i < inSlugOrder.length; i++) {
    const outcome = outcomes[i];
    if (outcome === OUT) continue;
    const s = inSlugOrder[i];
    if (outcome === ELIGIBLE) {
      if (excludedSet.has(s.slug)) continue;
      scorePoints(s, site, region, NO_CONTEXT, points, facts[i]);
      // Protected species go in a mix only when the user keeps them (see protected-species.ts).
      if (facts[i].protected && !lockSet.has(s.slug)) {
        withheld.push({ species: s, slug: s.slug, score: points.score, tieBreak: points.tieBreak });
      } else {
        items.push(paletteItemOf(s, points.score - points.hostPoints));
      }
    } else if (facts[i].milkweed && s.nativeStates.includes(region.state)) {
      milkweedNearMisses.push(scoreSpecies(s, site, region));
    }
  }
  const locked: string[] = [];
  let poorFitKept = false;
  for (const slug of lockRequests) {
    const s = species.get(slug);
    if (excludedSet.has(slug)) {
      notices.push(w.keptAndExcluded(s?.commonNames[0] ?? slug));
    } else if (!s) {
      notices.push(w.notInCatalogue(slug));
    } else if (!s.nativeStates.includes(region.state)) {
      notices.push(w.notNativeHere(s.commonNames[0]));
    } else {
      locked.push(slug);
      if (isProtectedSpecies(s)) notices.push(keptProtectedNotice(s, locale));
      if (hardCheckOutcome(s, site, region) !== 'eligible') {
        const r = scoreSpecies(s, site, region);
        notices.push(w.keptPoorFit(s.commonNames[0], reasonIn(r.ineligibleReason ?? '', locale)));
        scored.set(slug, r);
        items.push(toPaletteItem(s, r));
        poorFitKept = true;
      }
    }
  }
  const withheldSpecies = withheld.sort(compareScored).map((w) => w.species);
  if (withheldSpecies.length > 0) notices.push(withheldProtectedNotice(withheldSpecies, locale));
  // Slug order (slugs are unique here): canonical whatever the input order, what the optimiser
  // sorts by anyway (so its sort finds the list already in order), and searchable by slug.
  if (poorFitKept) items.sort(bySlug);
  return {
    items,
    scoredOf: (slug) => {
      const known = scored.get(slug);
      if (known !== undefined) return known;
      if (findBySlug(items, slug) === undefined) return undefined;
      const r = scoreSpecies(species.get(slug) as Species, site, region);
      scored.set(slug, r);
      return r;
    },
    species,
    milkweedNearMisses: milkweedNearMisses.sort(compareScored),
    withheld: withheldSpecies,
    locked,
    excluded,
    notices,
  };
}
