import type { PlantingMethod } from '../types/recommendation.js';

/**
 * From half an acre a planting is a meadow, sown by seeds/ft² rather than planted as counted plugs
 * (common practice: plugs at 12–18 in would run to tens of thousands of plants).
 */
export const MEADOW_FROM_SQ_FT = 21_780;

export function plantingMethodFor(areaSqFt: number): PlantingMethod {
  return areaSqFt >= MEADOW_FROM_SQ_FT ? 'seeding' : 'plugs';
}
