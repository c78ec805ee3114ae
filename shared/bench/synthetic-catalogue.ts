import { MOISTURE_LEVELS, SUN_LEVELS, type Species } from '../src/types/species.js';
import { randomInt, seededRandom } from '../src/palette-balancing/seeded-random.js';

/**
 * A big catalogue for the benchmark, made from the real records: each copy keeps its model's
 * genus (so caterpillar host counts stay per genus), growth form, native states and cautions, and
 * gets a new slug and name plus jittered traits (height, spread, bloom months, sun, moisture, deer
 * resistance), so the engine sees many distinct but plausible species. Same seed → same catalogue.
 * These are not species; they exist only to load the engine.
 */
export function syntheticCatalogue(models: readonly Species[], count: number, seed: number): Species[] {
  const rnd = seededRandom(seed);
  const out: Species[] = [];
  for (let k = 0; k < count; k++) {
    const model = models[k % models.length];
    const [genus, epithet] = model.scientificName.split(' ');
    const scale = 0.8 + rnd() * 0.45;
    const shift = randomInt(rnd, -1, 1);
    const months = [...new Set(model.bloomMonths.map((m) => Math.min(12, Math.max(1, m + shift))))];
    out.push({
      ...model,
      slug: `${model.slug}-x${k}`,
      scientificName: `${genus} ${epithet}x${k}`,
      commonNames: [`${model.commonNames[0]} variant ${k}`],
      heightCm: jitterRange(model.heightCm, scale),
      spreadCm: jitterRange(model.spreadCm, 0.8 + rnd() * 0.45),
      bloomMonths: months,
      sun: jitterLevels(SUN_LEVELS, model.sun, rnd),
      moisture: jitterLevels(MOISTURE_LEVELS, model.moisture, rnd),
      deerResistance: rnd() < 0.2 ? (['low', 'medium', 'high'] as const)[randomInt(rnd, 0, 2)] : model.deerResistance,
    });
  }
  return out;
}

function jitterRange(r: { min: number; max: number }, scale: number): { min: number; max: number } {
  const min = Math.max(1, Math.round(r.min * scale));
  return { min, max: Math.max(min, Math.round(r.max * scale)) };
}

/** Now and then widens or narrows a level list by one step, never to nothing. */
function jitterLevels<T extends string>(levels: readonly T[], taken: readonly T[], rnd: () => number): T[] {
  const r = rnd();
  if (r < 0.15 && taken.length > 1) return taken.slice(0, -1);
  if (r < 0.3) {
    const next = levels.find((l) => !taken.includes(l));
    if (next) return levels.filter((l) => taken.includes(l) || l === next);
  }
  return [...taken];
}
