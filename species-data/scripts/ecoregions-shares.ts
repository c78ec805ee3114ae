/** Turns raw overlap areas into the crosswalk's county shares and the regions' state lists. */
import type { StateCode } from '@homeground/shared';
import type { CountyOverlap } from './ecoregions-overlap.js';

export const MIN_COUNTY_SHARE = 0.01;
/**
 * A region counts as "in" a state when the overlap is at least this share of the region or of the state.
 * The overlaps below it (all under 0.08 %, none reaching 1 % of any county) are slivers from generalised
 * boundaries, while real edges such as the Ozark Highlands in Kansas or the Blue Ridge in West Virginia
 * sit at 0.1–0.5 %, so the cut is 0.1 % rather than 0.5 %.
 */
export const MIN_STATE_SHARE = 0.001;

const byCode = (a: string, b: string) => Number(a) - Number(b);

/**
 * Shares of a county by region: drop those under 1 %, renormalise, round to 3 decimals, and put any
 * rounding remainder on the largest so the written shares add to exactly 1.
 */
export function toShares(byRegion: Map<string, number>): { code: string; share: number }[] {
  const total = [...byRegion.values()].reduce((s, a) => s + a, 0);
  if (total <= 0) return [];
  const kept = [...byRegion].filter(([, a]) => a / total >= MIN_COUNTY_SHARE);
  const keptTotal = kept.reduce((s, [, a]) => s + a, 0);
  const shares = kept
    .map(([code, a]) => ({ code, share: Math.round((a / keptTotal) * 1000) / 1000 }))
    .sort((x, y) => y.share - x.share || byCode(x.code, y.code));
  const sum = shares.reduce((s, e) => s + e.share, 0);
  shares[0].share = Math.round((shares[0].share + 1 - sum) * 1000) / 1000;
  return shares;
}

export interface StateOverlap {
  state: StateCode;
  /** Overlap as a share of the region's area inside the counties. */
  ofRegion: number;
  /** Overlap as a share of the state's area. */
  ofState: number;
}

/**
 * Region × state overlap, summed from the county intersections (counties tile their state in the same
 * us-atlas topology, so the sum is the region ∩ state-outline area).
 */
export function stateOverlaps(overlaps: CountyOverlap[]): Map<string, StateOverlap[]> {
  const stateArea = new Map<StateCode, number>();
  const regionArea = new Map<string, number>();
  const cell = new Map<string, Map<StateCode, number>>();
  for (const o of overlaps) {
    const st = o.county.state;
    stateArea.set(st, (stateArea.get(st) ?? 0) + o.countyArea);
    for (const [code, a] of o.byRegion) {
      regionArea.set(code, (regionArea.get(code) ?? 0) + a);
      const row = cell.get(code) ?? new Map<StateCode, number>();
      row.set(st, (row.get(st) ?? 0) + a);
      cell.set(code, row);
    }
  }
  const out = new Map<string, StateOverlap[]>();
  for (const [code, row] of cell) {
    out.set(
      code,
      [...row]
        .map(([state, a]) => ({
          state,
          ofRegion: a / regionArea.get(code)!,
          ofState: a / stateArea.get(state)!,
        }))
        .sort((x, y) => x.state.localeCompare(y.state)),
    );
  }
  return out;
}

export function statesOf(overlaps: StateOverlap[]): StateCode[] {
  return overlaps.filter((o) => o.ofRegion >= MIN_STATE_SHARE || o.ofState >= MIN_STATE_SHARE).map((o) => o.state);
}
