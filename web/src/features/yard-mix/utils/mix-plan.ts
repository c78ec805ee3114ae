import type { PaletteRequest, SavedMix, SiteRequest } from '@homeground/shared';
import type { MixPlan } from '../../../config/paths.js';

// The plan's URL form (building and reading the query) lives in config/paths; this file turns a plan
// into the requests the engine answers, and a saved mix back into a plan.
export type { AreaUnit, MixPlan, MixRegion, PlanFromUrl } from '../../../config/paths.js';

function dropUndefined<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}

/**
 * The balance request that shows this plan. Once the mix's species are known they are all kept
 * (locked) at exactly that size, so the same mix comes back; the person's own locks and exclusions
 * wait for the next rebalance.
 */
export function balanceRequestFor(plan: MixPlan): PaletteRequest {
  const base = { site: plan.site, region: plan.region };
  if (plan.chosen && plan.chosen.length > 0) {
    return { ...base, options: { size: plan.chosen.length, locked: plan.chosen, excluded: [] } };
  }
  return {
    ...base,
    options: { ...(plan.size !== undefined ? { size: plan.size } : {}), locked: plan.locked, excluded: plan.excluded },
  };
}

/** The request a saved mix or a swap should remember: the person's options, not the "keep all" form. */
export function paletteRequestOf(plan: MixPlan): PaletteRequest {
  return {
    site: plan.site,
    region: plan.region,
    options: { ...(plan.size !== undefined ? { size: plan.size } : {}), locked: plan.locked, excluded: plan.excluded },
  };
}

/** A saved mix back into a plan; the API stores the site with its area in ft². */
export function planFromSavedMix(saved: SavedMix): MixPlan {
  const { site, region, options } = saved.request;
  return {
    region: { state: region.state, ...(region.ecoregionCode ? { ecoregionCode: region.ecoregionCode } : {}) },
    site: dropUndefined({ ...site }) as SiteRequest,
    areaUnit: 'ft2',
    ...(options.size !== undefined ? { size: options.size } : {}),
    locked: options.locked,
    excluded: options.excluded,
    chosen: saved.chosen,
  };
}
