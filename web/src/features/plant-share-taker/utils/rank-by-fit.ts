import type { FitResult } from '../../../api/plant-share/plant-share.types.js';

export interface RankedGroup<S> {
  /** `all` before the taker answers; then `fits` (best first) and `less-suited`. */
  group: 'all' | 'fits' | 'less-suited';
  items: { species: S; why?: readonly string[] }[];
}

/**
 * The species on offer in the engine's order for the taker's spot, each with its "why it fits";
 * species the engine left out follow under their own heading, so nothing on offer disappears.
 */
export function rankByFit<S extends { slug: string }>(species: readonly S[], fit: FitResult | null): RankedGroup<S>[] {
  if (!fit) return [{ group: 'all', items: species.map((s) => ({ species: s })) }];
  const bySlug = new Map(species.map((s) => [s.slug, s]));
  const fits = fit.ranked.flatMap((r) => {
    const s = bySlug.get(r.slug);
    return s ? [{ species: s, why: r.why }] : [];
  });
  const placed = new Set(fits.map((f) => f.species.slug));
  const reasons = new Map(fit.notSuited.map((n) => [n.slug, [n.why]]));
  const rest = species.filter((s) => !placed.has(s.slug)).map((s) => ({ species: s, why: reasons.get(s.slug) }));
  return [
    { group: 'fits' as const, items: fits },
    { group: 'less-suited' as const, items: rest },
  ].filter((g) => g.items.length > 0);
}
