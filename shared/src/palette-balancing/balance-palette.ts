import type { ChosenSpecies, PaletteConstraint, PaletteResult } from '../types/recommendation.js';
import { compareScored } from '../scoring/score-species.js';
import { isNativeMilkweed } from '../scoring/genus.js';
import { roundTo } from '../units/conversions.js';
import { bloomConstraints } from './bloom-constraints.js';
import { narrowCandidates } from './candidate-pool.js';
import type { ConstraintInput } from './constraint-input.js';
import { heightConstraint, grassConstraint, milkweedConstraint } from './mix-constraints.js';
import { mixSizeForArea } from './mix-size.js';
import { makeObjective, objectiveTerms } from './objective.js';
import { optimiseSelection } from './optimiser.js';
import { buildCandidates, type PaletteCandidates, type PaletteInput } from './palette-candidates.js';
import { rolesOf } from './mix-roles.js';
import { chooseWoodyLayer } from './woody-layer.js';
import { mixWordsFor } from './mix-words.js';
import { catalogueCoverage } from '../scoring/coverage.js';
import { plantingMethodFor } from '../quantities/planting-method.js';

/** The mix size: as asked, else from the area; never fewer than the locks nor more than the candidates. */
export function resolveSize(
  input: PaletteInput,
  c: PaletteCandidates,
): { size: number; reason: string; notices: string[] } {
  const fromArea = mixSizeForArea(input.site.areaSqFt);
  let size = input.options?.size ?? fromArea.size;
  const w = mixWordsFor(input.locale);
  // The area's sentence stays English here: reasons-in.ts says it again in the reader's language.
  let reason = input.options?.size !== undefined ? w.askedFor(size) : fromArea.reason;
  const notices: string[] = [];
  if (c.locked.length > size) {
    size = c.locked.length;
    reason = w.keptSoHolds(size);
  }
  if (c.items.length < size) {
    notices.push(w.onlySuit(c.items.length, size));
    size = c.items.length;
  }
  return { size, reason, notices };
}

export function reportConstraints(input: ConstraintInput): PaletteConstraint[] {
  return [...bloomConstraints(input), milkweedConstraint(input), grassConstraint(input), heightConstraint(input)];
}

/**
 * Builds a balanced mix for a site: the species that suit it, chosen to maximise the mix objective
 * (objective.ts) with greedy selection and swaps over the candidates worth searching
 * (candidate-pool.ts; a last pass tries every candidate), with "why it fits", each species' role in
 * the mix, and a report on every design rule (met, or why not). Protected species are chosen only
 * when the user keeps them (protected-species.ts).
 */
export function balancePalette(input: PaletteInput): PaletteResult {
  const plantingMethod = plantingMethodFor(input.site.areaSqFt);
  const coverage = catalogueCoverage(input.species, input.region);
  if (!coverage.covered) {
    return {
      size: 0,
      coverage,
      plantingMethod,
      sizeReason: coverage.message ?? '',
      chosen: [],
      objective: 0,
      terms: [],
      constraints: [],
      notices: [coverage.message ?? ''],
    };
  }
  const c = buildCandidates(input);
  const { size, reason, notices } = resolveSize(input, c);
  const settings = { size, monarchsGoal: input.site.goals.includes('monarchs') };
  const objective = makeObjective(settings);
  // The woody layer is chosen first and held; the optimiser balances the herbaceous rest around it.
  const woody = chooseWoodyLayer(c.items, input.site, c.locked);
  const held = [...c.locked, ...woody];
  const heldSet = new Set(held);
  const searchable = c.items.filter((i) => !i.woody || heldSet.has(i.slug));
  const selection = optimiseSelection(searchable, size, objective, {
    locked: held,
    searchPool: (pool) => narrowCandidates(pool, settings),
  });
  const chosen: ChosenSpecies[] = selection.chosen
    .map((item) => {
      const scored = c.scoredOf(item.slug)!;
      return {
        slug: item.slug,
        score: scored.score,
        parts: scored.parts,
        roles: rolesOf(item, selection.chosen, settings.monarchsGoal),
        locked: c.locked.includes(item.slug),
      };
    })
    .sort(compareScored);

  const milkweedNearMisses = c.milkweedNearMisses.map((r) => ({
    name: c.species.get(r.slug)!.commonNames[0],
    reason: r.ineligibleReason ?? '',
  }));

  return {
    size,
    coverage,
    plantingMethod,
    sizeReason: reason,
    chosen,
    objective: roundTo(selection.value, 4),
    terms: objectiveTerms(selection.chosen, settings).map((t) => ({ ...t, value: roundTo(t.value, 4) })),
    constraints: reportConstraints({
      chosen: selection.chosen,
      candidates: c.items,
      size,
      site: input.site,
      region: input.region,
      locked: c.locked,
      milkweedNearMisses,
      locale: input.locale,
      // Withheld species passed the checks, so they are native; the best three name the case.
      protectedMilkweeds: c.withheld
        .filter(isNativeMilkweed)
        .slice(0, 3)
        .map((s) => s.commonNames[0]),
    }),
    notices: [...c.notices, ...notices],
  };
}
