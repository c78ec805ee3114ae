import type { Species } from '../types/species.js';
import { cmToInches, inchesToCm } from '../units/conversions.js';

/**
 * On-centre spacing geometry (X: square grid, CHECK-VALUES §3 "geometry"): plants at s inches on
 * centre each take s² in², so plants/ft² = 144 ÷ s². Metric: plants/m² = 10,000 ÷ s² (s in cm).
 */
export function plantsPerSqFt(spacingIn: number): number {
  return 144 / spacingIn ** 2;
}

export function plantsPerSqM(spacingCm: number): number {
  return 10_000 / spacingCm ** 2;
}

/**
 * Default on-centre spacing for a species, in inches, from its mature spread. Plugs of perennials
 * and grasses go 12–18 in apart (typical, CHECK-VALUES §3, M: from-memory): 12 in when the plant
 * stays under 18 in (45 cm) wide, 18 in up to 3 ft (90 cm), 24 in for wider perennials. Shrubs,
 * trees and vines are spaced at the narrow end of their spread, never under 3 ft, so neighbours
 * just touch at maturity (common practice).
 */
export function defaultSpacingIn(species: Pick<Species, 'growthForm' | 'spreadCm'>): number {
  const { growthForm, spreadCm } = species;
  if (growthForm === 'shrub' || growthForm === 'tree' || growthForm === 'vine') {
    return Math.max(36, Math.round(cmToInches(spreadCm.min) / 6) * 6);
  }
  if (spreadCm.max <= 45) return 12;
  if (spreadCm.max <= 90) return 18;
  return 24;
}

export interface Spacing {
  spacingIn: number;
  spacingCm: number;
  plantsPerSqFt: number;
  plantsPerSqM: number;
}

/** A spacing with its densities in both unit systems. */
export function describeSpacing(spacingIn: number): Spacing {
  const spacingCm = inchesToCm(spacingIn);
  return { spacingIn, spacingCm, plantsPerSqFt: plantsPerSqFt(spacingIn), plantsPerSqM: plantsPerSqM(spacingCm) };
}
