import type { ScoredSpecies } from '../types/recommendation.js';
import type { Species } from '../types/species.js';

/**
 * Score descending; ties to the species that thrives here rather than copes, then to more wildlife
 * value within its layer (tieBreak); only then the slug, so the same input always gives the same order.
 */
export function compareScored(
  a: Pick<ScoredSpecies, 'slug' | 'score' | 'tieBreak'>,
  b: Pick<ScoredSpecies, 'slug' | 'score' | 'tieBreak'>,
): number {
  return b.score - a.score || (b.tieBreak ?? 0) - (a.tieBreak ?? 0) || (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0);
}

/**
 * Sorting a ranking of 10,000 species with compareScored cost as much as scoring a good part of
 * them. Instead each species gets one number that sorts the same way, and a typed array of those
 * numbers sorts natively, before any "why it fits" is built.
 *
 * The number packs, from most to least significant: the score and the tie-break in hundredths
 * (both are rounded to hundredths, so nothing is lost), each negated for a descending order, then
 * the species' place in the catalogue in slug order. Slug order is worked out once per catalogue
 * (the API passes the same array until the catalogue changes); equal slugs keep catalogue order,
 * as a stable sort by compareScored does. Values out of the packed ranges (never on a real
 * catalogue) give NaN, and the caller falls back to compareScored.
 */
const POINT_SPAN = 2 ** 15; // hundredths of a point: ±163.83 points
const POINT_OFFSET = 2 ** 14;
/** Catalogues of up to 262,144 records. */
export const RANK_SPAN = 2 ** 18;

export interface SlugOrder {
  /** Each record's place in slug order, by catalogue index. */
  ranks: Int32Array;
  /** The catalogue index at each place in slug order. */
  indexAt: Int32Array;
}

const orders = new WeakMap<readonly Species[], SlugOrder>();

export function slugOrder(catalogue: readonly Species[]): SlugOrder {
  const known = orders.get(catalogue);
  if (known !== undefined) return known;
  const indexAt = Int32Array.from(catalogue.keys()).sort((a, b) => {
    const x = catalogue[a].slug;
    const y = catalogue[b].slug;
    return x < y ? -1 : x > y ? 1 : a - b;
  });
  const ranks = new Int32Array(catalogue.length);
  for (let rank = 0; rank < indexAt.length; rank++) ranks[indexAt[rank]] = rank;
  const order = { ranks, indexAt };
  orders.set(catalogue, order);
  return order;
}

/** The sort key of a score, tie-break and slug rank (ascending key = compareScored order), or NaN. */
export function scoreKey(score: number, tieBreak: number, rank: number): number {
  const s = POINT_OFFSET - Math.round(score * 100);
  const t = POINT_OFFSET - Math.round(tieBreak * 100);
  if (!(s > 0 && s < POINT_SPAN && t > 0 && t < POINT_SPAN && rank >= 0 && rank < RANK_SPAN)) return NaN;
  return (s * POINT_SPAN + t) * RANK_SPAN + rank;
}

/** The slug rank a key was made with. */
export function rankOfKey(key: number): number {
  return key % RANK_SPAN;
}
