import type { PaletteAlternative } from '../types/recommendation.js';
import type { GrowthForm } from '../types/species.js';
import { roundTo } from '../units/conversions.js';
import { makeObjective } from './objective.js';
import { buildCandidates, type PaletteInput } from './palette-candidates.js';

const bySlug = (a: { slug: string }, b: { slug: string }) => (a.slug < b.slug ? -1 : a.slug > b.slug ? 1 : 0);

/**
 * A swap keeps the slot's kind unless asked otherwise: a wildflower for a wildflower, a grass or
 * sedge for a grass or sedge, a fern for a fern, a woody plant for a woody plant.
 */
type FormKind = 'wildflower' | 'grass' | 'fern' | 'woody';
function formKind(form: GrowthForm | undefined): FormKind {
  if (form === 'graminoid') return 'grass';
  if (form === 'fern') return 'fern';
  if (form === 'shrub' || form === 'tree' || form === 'vine') return 'woody';
  return 'wildflower';
}

/**
 * The best replacements for one species of a mix (`slot`), each with the change in the mix
 * objective if it took the slot (negative: the mix gets a little worse, in exchange for the
 * user's choice). Best first, ties by slug; excluded species and species already in the mix never
 * appear.
 */
export function alternativesFor(
  input: PaletteInput,
  chosenSlugs: readonly string[],
  slot: string,
  limit = 5,
  options: { acrossForms?: boolean } = {},
): PaletteAlternative[] {
  const c = buildCandidates(input);
  const kindOf = (slug: string) => formKind(c.species.get(slug)?.growthForm);
  const slotKind = kindOf(slot);
  const inMix = new Set(chosenSlugs);
  const chosen = c.items.filter((i) => inMix.has(i.slug)).sort(bySlug);
  if (!chosen.some((i) => i.slug === slot)) return [];
  const objective = makeObjective({ size: chosenSlugs.length, monarchsGoal: input.site.goals.includes('monarchs') });
  const current = objective(chosen);
  const without = chosen.filter((i) => i.slug !== slot);
  return c.items
    .filter((i) => !inMix.has(i.slug) && (options.acrossForms || kindOf(i.slug) === slotKind))
    .map((i) => ({ item: i, change: objective([...without, i].sort(bySlug)) - current }))
    .sort((a, b) => b.change - a.change || bySlug(a.item, b.item))
    .slice(0, limit)
    .map(({ item, change }) => {
      const scored = c.scoredOf(item.slug)!;
      return { slug: item.slug, objectiveChange: roundTo(change, 4), score: scored.score, parts: scored.parts };
    });
}
