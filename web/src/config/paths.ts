/**
 * Every URL in the web app. Routes use `path`; links call `build()` so a changed URL has one home.
 */
export const paths = {
  home: { path: '/', build: () => '/' },
  signIn: {
    path: '/sign-in',
    /** `next` is where to go after signing in; only same-site paths are kept. */
    build: (next?: string) => withNext('/sign-in', next),
  },
  register: { path: '/register', build: (next?: string) => withNext('/register', next) },
  account: { path: '/account', build: () => '/account' },
  findPlants: { path: '/find-plants', build: () => '/find-plants' },
  /** A saved yard mix; anyone with the link can open it. */
  savedMix: { path: '/mixes/:id', build: (id: string) => `/mixes/${encodeURIComponent(id)}` },
  species: { path: '/species', build: () => '/species' },
  speciesDetail: { path: '/species/:slug', build: (slug: string) => `/species/${encodeURIComponent(slug)}` },
  cardsLabels: { path: '/cards-and-labels', build: () => '/cards-and-labels' },
  season: { path: '/season', build: () => '/season' },
  myBatches: { path: '/my-batches', build: () => '/my-batches' },
  plantShare: { path: '/plant-share', build: () => '/plant-share' },
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
