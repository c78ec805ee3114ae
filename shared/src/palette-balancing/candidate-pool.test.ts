import { describe, expect, it } from 'vitest';
import { narrowCandidates } from './candidate-pool.js';
import { makeObjective } from './objective.js';
import { optimiseSelection } from './optimiser.js';
import type { PaletteItem } from './palette-item.js';

// Behaviour of Homeground's own search narrowing (candidate-pool.ts); no outside values.
const item = (slug: string, fit: number, extra: Partial<PaletteItem> = {}): PaletteItem => ({
  slug,
  name: slug,
  fit,
  periods: ['mid'],
  flowering: true,
  genus: `G${slug}`,
  hostCount: 0,
  tier: 'middle',
  colours: ['yellow'],
  graminoid: false,
  milkweed: false,
  ...extra,
});
// 80 good midsummer forbs, and a few weak ones that alone meet other needs.
const strong = Array.from({ length: 80 }, (_, i) =>
  item(`m${String(i).padStart(2, '0')}`, 20 - i / 10, { genus: 'Solidago', hostCount: 115 }),
);
const lateBloomer = item('late', 1, { periods: ['late'] });
const grass = item('grass', 0.5, {
  periods: [],
  flowering: false,
  colours: [],
  graminoid: true,
  genus: 'Carex',
  hostCount: 36,
});
const milkweed = item('milkweed', 0.2, { genus: 'Asclepias', hostCount: 12, milkweed: true });
const all = [...strong, lateBloomer, grass, milkweed];
const settings = { size: 9, monarchsGoal: true };

describe('narrowCandidates', () => {
  it('keeps the best by fit plus the best for every need, and drops the rest', () => {
    const kept = narrowCandidates(all, settings).map((i) => i.slug);
    expect(kept).toEqual(expect.arrayContaining(['m00', 'm26', 'late', 'grass', 'milkweed']));
    expect(kept).not.toContain('m79');
    expect(kept.length).toBeLessThan(all.length);
  });

  it('does not depend on the input order', () => {
    expect(narrowCandidates([...all].reverse(), settings)).toEqual(narrowCandidates(all, settings));
  });

  it('a narrowed search still leaves no improving single swap among all candidates', () => {
    const objective = makeObjective(settings);
    // Narrow to the weakest 17 on purpose: the final pass over every candidate must repair it.
    const narrowed = (pool: readonly PaletteItem[]) => pool.filter((i) => i.fit < 13.5);
    expect(narrowed(all).length).toBe(17);
    const r = optimiseSelection(all, settings.size, objective, { searchPool: narrowed });
    expect(r.swaps).toBeGreaterThan(0);
    const full = optimiseSelection(all, settings.size, objective);
    expect(r.value).toBeGreaterThanOrEqual(full.value - 1e-9);
    const chosen = new Set(r.chosen);
    for (const out of r.chosen) {
      for (const inn of all.filter((i) => !chosen.has(i))) {
        const swapped = [...r.chosen.filter((c) => c !== out), inn].sort((a, b) => (a.slug < b.slug ? -1 : 1));
        expect(objective(swapped)).toBeLessThanOrEqual(r.value + 1e-9);
      }
    }
  });
});
