import {
  DEER_PRESSURES, GOALS, type Goal, MOISTURE_LEVELS, type PaletteRequest, type SavedMix, SOIL_TEXTURES, type SiteRequest,
  type StateCode, stateCodeSchema, SUN_LEVELS, siteRequestSchema, slugSchema,
} from '@homeground/shared';

/** Which unit the person gave the area in; the request sends that unit and the API converts. */
export type AreaUnit = 'ft2' | 'm2';

export interface MixRegion {
  state: StateCode;
  /** EPA Level III code; absent when the person chose only a state. */
  ecoregionCode?: string;
}

/**
 * Everything that decides a yard mix, as the URL carries it: your ground, your yard, the size and
 * the person's locks and exclusions, and, once a mix exists, the species in it (`chosen`), so a
 * shared link reopens exactly the same mix even after swaps.
 */
export interface MixPlan {
  region: MixRegion;
  site: SiteRequest;
  areaUnit: AreaUnit;
  size?: number;
  locked: string[];
  excluded: string[];
  chosen?: string[];
}

const list = (value: string | null): string[] => (value ? value.split(',').filter((s) => slugSchema.safeParse(s).success) : []);
const oneOf = <T extends string>(options: readonly T[], value: string | null): T | undefined =>
  options.includes(value as T) ? (value as T) : undefined;
const num = (value: string | null): number | undefined => {
  if (value === null || value.trim() === '') return undefined;
  const n = Number(value);
  return Number.isFinite(n) ? n : undefined;
};

/** Short, readable query keys, so a shared link can be read and trimmed by hand. */
export function planToSearchParams(plan: MixPlan): URLSearchParams {
  const p = new URLSearchParams();
  p.set('state', plan.region.state);
  if (plan.region.ecoregionCode) p.set('eco', plan.region.ecoregionCode);
  const s = plan.site;
  p.set('sun', s.sun);
  p.set('moisture', s.moisture);
  if (s.soilTexture) p.set('soil', s.soilTexture);
  const area = plan.areaUnit === 'm2' ? s.areaSqM : s.areaSqFt;
  if (area !== undefined) p.set('area', String(area));
  p.set('unit', plan.areaUnit);
  if (s.maxHeightCm !== undefined) p.set('maxh', String(s.maxHeightCm));
  p.set('deer', s.deerPressure);
  if (s.goals.length > 0) p.set('goals', s.goals.join(','));
  if (s.woodyPlants) p.set('woody', '1');
  if (s.spreaders) p.set('spreaders', '1');
  if (plan.size !== undefined) p.set('size', String(plan.size));
  if (plan.locked.length > 0) p.set('locked', plan.locked.join(','));
  if (plan.excluded.length > 0) p.set('excluded', plan.excluded.join(','));
  if (plan.chosen && plan.chosen.length > 0) p.set('chosen', plan.chosen.join(','));
  return p;
}

export type PlanFromUrl = { kind: 'none' } | { kind: 'plan'; plan: MixPlan } | { kind: 'invalid'; problems: string[] };

/** True when the URL carries yard answers at all (a shared link or a finished form). */
export function hasPlanParams(params: URLSearchParams): boolean {
  return params.has('sun') || params.has('area');
}

/** Reads a plan back, checking it with the shared site schema so a hand-edited link fails in words. */
export function planFromSearchParams(params: URLSearchParams): PlanFromUrl {
  if (!hasPlanParams(params)) return { kind: 'none' };
  const problems: string[] = [];
  const state = stateCodeSchema.safeParse(params.get('state'));
  if (!state.success) problems.push('the state is missing or not a US state code');
  const areaUnit: AreaUnit = params.get('unit') === 'm2' ? 'm2' : 'ft2';
  const area = num(params.get('area'));
  const goals = list(params.get('goals')).filter((g): g is Goal => (GOALS as readonly string[]).includes(g));
  const candidate = {
    sun: oneOf(SUN_LEVELS, params.get('sun')),
    moisture: oneOf(MOISTURE_LEVELS, params.get('moisture')),
    soilTexture: oneOf(SOIL_TEXTURES, params.get('soil')),
    ...(areaUnit === 'm2' ? { areaSqM: area } : { areaSqFt: area }),
    maxHeightCm: num(params.get('maxh')),
    deerPressure: oneOf(DEER_PRESSURES, params.get('deer')),
    goals,
    woodyPlants: params.get('woody') === '1' ? true : undefined,
    spreaders: params.get('spreaders') === '1' ? true : undefined,
  };
  const site = siteRequestSchema.safeParse(candidate);
  if (!site.success) {
    for (const issue of site.error.issues) problems.push(`${issue.path.join('.') || 'site'}: ${issue.message}`);
  }
  if (problems.length > 0 || !state.success || !site.success) return { kind: 'invalid', problems };
  const eco = params.get('eco');
  const chosen = list(params.get('chosen'));
  const size = num(params.get('size'));
  return {
    kind: 'plan',
    plan: {
      region: { state: state.data, ...(eco && /^\d{1,2}$/.test(eco) ? { ecoregionCode: eco } : {}) },
      site: dropUndefined(candidate) as SiteRequest,
      areaUnit,
      ...(size !== undefined && Number.isInteger(size) ? { size } : {}),
      locked: list(params.get('locked')),
      excluded: list(params.get('excluded')),
      ...(chosen.length > 0 ? { chosen } : {}),
    },
  };
}

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
  return { ...base, options: { ...(plan.size !== undefined ? { size: plan.size } : {}), locked: plan.locked, excluded: plan.excluded } };
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

/** Just your ground from the URL, for the yard step before any yard answers exist. */
export function regionFromSearchParams(params: URLSearchParams): MixRegion | null {
  const state = stateCodeSchema.safeParse(params.get('state'));
  if (!state.success) return null;
  const eco = params.get('eco');
  return { state: state.data, ...(eco && /^\d{1,2}$/.test(eco) ? { ecoregionCode: eco } : {}) };
}
