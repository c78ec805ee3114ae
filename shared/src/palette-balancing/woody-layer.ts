import type { Site } from '../types/site.js';
import { woodySpeciesFor } from '../scoring/layers.js';
import type { PaletteItem } from './palette-item.js';

/**
 * The woody layer of a mix that asks for one: the best few shrubs, small trees or vines (by fit,
 * then host value within the layer), one per genus, as many as the area allows
 * (woodySpeciesFor). Kept woody species count towards that number. Chosen before the herbaceous
 * mix, so the balancing of flowers and grasses never trades a wildflower for a second shrub.
 */
export function chooseWoodyLayer(items: readonly PaletteItem[], site: Site, kept: readonly string[]): string[] {
  if (!site.woodyPlants) return [];
  const keptSet = new Set(kept);
  const keptWoody = items.filter((i) => i.woody && keptSet.has(i.slug)).map((i) => i.slug);
  const room = woodySpeciesFor(site.areaSqFt) - keptWoody.length;
  if (room <= 0) return [];
  const genera = new Set(items.filter((i) => keptSet.has(i.slug)).map((i) => i.genus));
  const ranked = items
    .filter((i) => i.woody && !keptSet.has(i.slug))
    .sort((a, b) => b.fit + b.hostCount / 40 - (a.fit + a.hostCount / 40) || (a.slug < b.slug ? -1 : 1));
  const chosen: string[] = [];
  for (const it of ranked) {
    if (chosen.length >= room) break;
    if (genera.has(it.genus)) continue;
    genera.add(it.genus);
    chosen.push(it.slug);
  }
  return chosen;
}
