import { type CardsSelection, cardsSelectionToSearchParams, parseCardsSelection } from './search/cards-search.js';
import {
  type FindPlantsSearch,
  type FindPlantsStep,
  findPlantsSearchParams,
  type MixPlan,
  type MixRegion,
  parseFindPlantsSearch,
} from './search/find-plants-search.js';
import { withQuery } from './search/query-values.js';
import {
  type BrowserState,
  browserStateToSearchParams,
  EMPTY_STATE,
  parseBrowserState,
} from './search/species-search.js';

/**
 * Every URL in the web app, built and parsed here and nowhere else. Routes use `path`; links call
 * `build()`; pages that keep their state in the query string read it with `parse()` and write it
 * with `search()`, so a changed key or default has one home.
 */
export const paths = {
  home: { path: '/', build: () => '/' },
  signIn: {
    path: '/sign-in',
    /** `next` is where to go after signing in; only same-site paths are kept. */
    build: (next?: string) => withNext('/sign-in', next),
    parse: parseNext,
  },
  register: { path: '/register', build: (next?: string) => withNext('/register', next), parse: parseNext },
  /** The link in a sign-up confirmation e-mail. */
  confirmRegistration: {
    path: '/register/confirm/:token',
    build: (token: string) => `/register/confirm/${encodeURIComponent(token)}`,
  },
  account: { path: '/account', build: () => '/account' },
  findPlants: {
    path: '/find-plants',
    /** Find plants at a step, for your ground, or a whole plan (the mix's share link). */
    build: (target?: { plan?: MixPlan; region?: MixRegion; step?: FindPlantsStep }) =>
      withQuery('/find-plants', findPlantsSearchParams(target)),
    parse: (params: URLSearchParams): FindPlantsSearch => parseFindPlantsSearch(params),
    search: findPlantsSearchParams,
  },
  /** A saved yard mix; anyone with the link can open it. */
  savedMix: { path: '/mixes/:id', build: (id: string) => `/mixes/${encodeURIComponent(id)}` },
  species: {
    path: '/species',
    /** The browser with some filters set, e.g. `build({ state: 'WI', monarchHost: true })`. */
    build: (filters: Partial<BrowserState> = {}) =>
      withQuery('/species', browserStateToSearchParams({ ...EMPTY_STATE, ...filters })),
    parse: parseBrowserState,
    search: browserStateToSearchParams,
  },
  speciesDetail: { path: '/species/:slug', build: (slug: string) => `/species/${encodeURIComponent(slug)}` },
  /** Curators: a blank species form. */
  speciesNew: { path: '/species/new', build: () => '/species/new' },
  /** Curators: import species from a CSV file, previewed before anything is written. */
  speciesImport: { path: '/species/import', build: () => '/species/import' },
  /** Curators: one record's form. */
  speciesEdit: {
    path: '/species/:slug/edit',
    build: (slug: string) => `/species/${encodeURIComponent(slug)}/edit`,
  },
  cardsLabels: {
    path: '/cards-and-labels',
    /** Cards for these species (`?species=a,b`) and/or a saved mix's (`?mix=id`). */
    build: (selection: Partial<CardsSelection> = {}) =>
      withQuery('/cards-and-labels', cardsSelectionToSearchParams(selection)),
    parse: parseCardsSelection,
    search: cardsSelectionToSearchParams,
  },
  /** A growing group: its place, frost date and people. */
  group: { path: '/groups/:slug', build: (slug: string) => `/groups/${encodeURIComponent(slug)}` },
  /** The link in an invitation e-mail. */
  invitation: { path: '/invitations/:token', build: (token: string) => `/invitations/${encodeURIComponent(token)}` },
  season: { path: '/season', build: () => '/season' },
  myBatches: { path: '/my-batches', build: () => '/my-batches' },
  /** The organiser's plant share: the day, slots, limits and stock; open, pause, close. */
  plantShare: { path: '/plant-share', build: () => '/plant-share' },
  /** Pickup day: the printable list per slot, check-in and walk-up. */
  plantSharePickup: { path: '/plant-share/pickup', build: () => '/plant-share/pickup' },
  /** The season report: what the share gave, against the season's targets. */
  plantShareReport: { path: '/plant-share/report', build: () => '/plant-share/report' },
  /** What a group's plant share offers; public, the link organisers hand out. */
  shareAvailable: {
    path: '/share/:groupSlug',
    build: (groupSlug: string) => `/share/${encodeURIComponent(groupSlug)}`,
  },
  /** Plants held for a household on the waitlist, opened by the link in the offer e-mail (the API writes it). */
  waitlistOffer: {
    path: '/plant-share/offers/:token',
    build: (token: string) => `/plant-share/offers/${encodeURIComponent(token)}`,
  },
  /** A reservation, opened by the private link in its confirmation e-mail (the API writes that link). */
  reservation: {
    path: '/plant-share/reservations/:token',
    build: (token: string) => `/plant-share/reservations/${encodeURIComponent(token)}`,
  },
  /** Curators: the catalogue's differences from the open reference data not yet explained. */
  referenceChecks: { path: '/reference-checks', build: () => '/reference-checks' },
  /** Admins: every account, its role, switch-off and sign-in activity. */
  people: { path: '/people', build: () => '/people' },
} as const;

/**
 * Accepts only a path on this site ("/account"), never "//other.host" or "https://…",
 * so a crafted sign-in link cannot send people elsewhere after they sign in.
 */
export function safeNextPath(next: string | null | undefined): string | undefined {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return undefined;
  return next;
}

function withNext(base: string, next?: string): string {
  const safe = safeNextPath(next);
  return safe && safe !== '/' ? `${base}?next=${encodeURIComponent(safe)}` : base;
}

/** The sign-in and register pages' `next`, when it is a path on this site. */
function parseNext(params: URLSearchParams): { next?: string } {
  const next = safeNextPath(params.get('next'));
  return next ? { next } : {};
}

export type { BrowserState, SortOrder, SpeciesSort } from './search/species-search.js';
export { DEFAULT_PAGE_SIZE, EMPTY_STATE, PAGE_SIZES } from './search/species-search.js';
export type { CardsSelection } from './search/cards-search.js';
export type {
  AreaUnit,
  FindPlantsSearch,
  FindPlantsStep,
  MixPlan,
  MixRegion,
  PlanFromUrl,
} from './search/find-plants-search.js';
export { stepOf, withGround, withStep } from './search/find-plants-search.js';
