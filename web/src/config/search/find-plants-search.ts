import {
  DEER_PRESSURES,
  GOALS,
  type Goal,
  MOISTURE_LEVELS,
  SOIL_TEXTURES,
  type SiteRequest,
  type StateCode,
  stateCodeSchema,
  SUN_LEVELS,
  siteRequestSchema,
  slugSchema,
} from '@homeground/shared';
import { finiteNumber, oneOf } from './query-values.js';

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

export type PlanFromUrl = { kind: 'none' } | { kind: 'plan'; plan: MixPlan } | { kind: 'invalid'; problems: string[] };

/** The three screens of Find plants; the mix is the default once a region and yard answers exist. */
export type FindPlantsStep = 'ground' | 'yard' | 'mix';

/** Find plants as its URL says it: the step asked for, your ground, and the yard plan if any. */
export interface FindPlantsSearch {
  requestedStep?: Exclude<FindPlantsStep, 'mix'>;
  region: MixRegion | null;
  plan: PlanFromUrl;
}

/** Keys that belong to a finished mix; a new ground or new yard answers make them stale. */
export const MIX_KEYS = ['chosen', 'locked', 'excluded', 'size'] as const;

const list = (value: string | null): string[] =>
  value ? value.split(',').filter((s) => slugSchema.safeParse(s).success) : [];

function dropUndefined<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}

function regionOf(state: StateCode, eco: string | null): MixRegion {
  return { state, ...(eco && /^\d{1,2}$/.test(eco) ? { ecoregionCode: eco } : {}) };
}

/** Short, readable query keys, so a shared link can be read and trimmed by hand. */
export function planToSearchParams(plan: MixPlan): URLSearchParams {
  const p = regionToSearchParams(plan.region);
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

export function regionToSearchParams(region: MixRegion): URLSearchParams {
  const p = new URLSearchParams();
  p.set('state', region.state);
  if (region.ecoregionCode) p.set('eco', region.ecoregionCode);
  return p;
}

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
  const area = finiteNumber(params.get('area'));
  const goals = list(params.get('goals')).filter((g): g is Goal => (GOALS as readonly string[]).includes(g));
  const candidate = {
    sun: oneOf(SUN_LEVELS, params.get('sun')),
    moisture: oneOf(MOISTURE_LEVELS, params.get('moisture')),
    soilTexture: oneOf(SOIL_TEXTURES, params.get('soil')),
    ...(areaUnit === 'm2' ? { areaSqM: area } : { areaSqFt: area }),
    maxHeightCm: finiteNumber(params.get('maxh')),
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
  const chosen = list(params.get('chosen'));
  const size = finiteNumber(params.get('size'));
  return {
    kind: 'plan',
    plan: {
      region: regionOf(state.data, params.get('eco')),
      site: dropUndefined(candidate) as SiteRequest,
      areaUnit,
      ...(size !== undefined && Number.isInteger(size) ? { size } : {}),
      locked: list(params.get('locked')),
      excluded: list(params.get('excluded')),
      ...(chosen.length > 0 ? { chosen } : {}),
    },
  };
}

/** Just your ground from the URL, for the yard step before any yard answers exist. */
export function regionFromSearchParams(params: URLSearchParams): MixRegion | null {
  const state = stateCodeSchema.safeParse(params.get('state'));
  return state.success ? regionOf(state.data, params.get('eco')) : null;
}

export function parseFindPlantsSearch(params: URLSearchParams): FindPlantsSearch {
  const step = params.get('step');
  return {
    ...(step === 'ground' || step === 'yard' ? { requestedStep: step } : {}),
    region: regionFromSearchParams(params),
    plan: planFromSearchParams(params),
  };
}

/** The step a URL shows: your ground until there is one, your yard until there are answers, then the mix. */
export function stepOf(search: FindPlantsSearch): FindPlantsStep {
  if (search.requestedStep === 'ground' || !search.region) return 'ground';
  if (search.requestedStep === 'yard' || search.plan.kind === 'none') return 'yard';
  return 'mix';
}

/**
 * A Find plants URL's query: a whole plan (the mix's share link), or just your ground, and the step
 * to show when it is not the mix.
 */
export function findPlantsSearchParams(
  target: { plan?: MixPlan; region?: MixRegion; step?: FindPlantsStep } = {},
): URLSearchParams {
  const p = target.plan
    ? planToSearchParams(target.plan)
    : target.region
      ? regionToSearchParams(target.region)
      : new URLSearchParams();
  if (target.step && target.step !== 'mix') p.set('step', target.step);
  return p;
}

/** The same query showing another step; every answer stays (the back button walks the steps). */
export function withStep(params: URLSearchParams, step: FindPlantsStep): URLSearchParams {
  const p = new URLSearchParams(params);
  if (step === 'mix') p.delete('step');
  else p.set('step', step);
  return p;
}

/** A newly chosen ground: the yard answers stay, the finished mix's keys go, and the yard step shows. */
export function withGround(params: URLSearchParams, region: MixRegion): URLSearchParams {
  const p = new URLSearchParams(params);
  p.set('state', region.state);
  if (region.ecoregionCode) p.set('eco', region.ecoregionCode);
  else p.delete('eco');
  MIX_KEYS.forEach((k) => p.delete(k));
  return withStep(p, 'yard');
}
