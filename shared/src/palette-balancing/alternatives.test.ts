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
  const alts = alternativesFor(input, chosen, slot);

  it('lists outsiders only, best change first, never an excluded species', () => {
    expect(alts.length).toBeGreaterThan(0);
    for (const a of alts) expect([...chosen, 'monarda-fistulosa']).not.toContain(a.slug);
    for (let i = 1; i < alts.length; i++) expect(alts[i - 1].objectiveChange).toBeGreaterThanOrEqual(alts[i].objectiveChange);
  });

  it('the change is the objective with the swap minus the objective without it', () => {
    const c = buildCandidates(input);
    const f = makeObjective({ size: chosen.length, monarchsGoal: true });
    const set = (slugs: string[]) => c.items.filter((i) => slugs.includes(i.slug)).sort((a, b) => (a.slug < b.slug ? -1 : 1));
    const swapped = [...chosen.filter((s) => s !== slot), alts[0].slug];
    expect(alts[0].objectiveChange).toBeCloseTo(f(set(swapped)) - f(set(chosen)), 3);
  });

  it('the optimised mix has no improving single swap left (every change ≤ 0)', () => {
    for (const s of chosen) for (const a of alternativesFor(input, chosen, s)) expect(a.objectiveChange).toBeLessThanOrEqual(1e-6);
  });

  it('returns nothing for a slot that is not in the mix', () => {
    expect(alternativesFor(input, chosen, 'not-in-mix')).toEqual([]);
  });
});
