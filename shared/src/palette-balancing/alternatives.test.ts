import { describe, expect, it } from 'vitest';
import type { Site } from '../types/site.js';
import { F, LARKFIELD } from '../scoring/__tests__/species-fixtures.js';
import { alternativesFor } from './alternatives.js';
import { balancePalette } from './balance-palette.js';
import { makeObjective } from './objective.js';
import { buildCandidates } from './palette-candidates.js';

const site: Site = { sun: 'full', moisture: 'medium', areaSqFt: 120, deerPressure: 'medium', goals: ['monarchs'] };
const input = { species: Object.values(F), site, region: LARKFIELD, options: { excluded: ['monarda-fistulosa'] } };

describe('alternativesFor (best replacements for one species of the mix)', () => {
  const mix = balancePalette(input);
  const chosen = mix.chosen.map((c) => c.slug);
  const slot = chosen[0];
  // Across growth forms, so the slot's kind does not narrow the list this test reasons about.
  const alts = alternativesFor(input, chosen, slot, 5, { acrossForms: true });

  it('lists outsiders only, best change first, never an excluded species', () => {
    expect(alts.length).toBeGreaterThan(0);
    for (const a of alts) expect([...chosen, 'monarda-fistulosa']).not.toContain(a.slug);
    for (let i = 1; i < alts.length; i++)
      expect(alts[i - 1].objectiveChange).toBeGreaterThanOrEqual(alts[i].objectiveChange);
  });

  it('the change is the objective with the swap minus the objective without it', () => {
    const c = buildCandidates(input);
    const f = makeObjective({ size: chosen.length, monarchsGoal: true });
    const set = (slugs: string[]) =>
      c.items.filter((i) => slugs.includes(i.slug)).sort((a, b) => (a.slug < b.slug ? -1 : 1));
    const swapped = [...chosen.filter((s) => s !== slot), alts[0].slug];
    expect(alts[0].objectiveChange).toBeCloseTo(f(set(swapped)) - f(set(chosen)), 3);
  });

  it('the optimised mix has no improving single swap left (every change ≤ 0)', () => {
    for (const s of chosen)
      for (const a of alternativesFor(input, chosen, s, 5, { acrossForms: true }))
        expect(a.objectiveChange).toBeLessThanOrEqual(1e-6);
  });

  it('returns nothing for a slot that is not in the mix', () => {
    expect(alternativesFor(input, chosen, 'not-in-mix')).toEqual([]);
  });
});

describe("alternativesFor keeps the slot's kind unless asked", () => {
  it('a wildflower for a wildflower by default; any growth form on request', () => {
    const mix = balancePalette(input).chosen.map((c) => c.slug);
    const flower = mix.find(
      (s) => F[Object.keys(F).find((k) => F[k as keyof typeof F].slug === s) as keyof typeof F]?.growthForm === 'forb',
    )!;
    const forms = (list: { slug: string }[]) =>
      list.map((a) => Object.values(F).find((f) => f.slug === a.slug)!.growthForm);
    expect(forms(alternativesFor(input, mix, flower, 20)).every((f) => f === 'forb')).toBe(true);
    expect(forms(alternativesFor(input, mix, flower, 20, { acrossForms: true })).some((f) => f !== 'forb')).toBe(true);
  });
});
