import { formatArea } from '../units/format-units.js';

/**
 * How many species a mix holds, from the planting area (Homeground's rule). Each species should
 * get room for a group of several plants, which reads as a drift rather than a lone plant and lets
 * it seed and fill in: at 12–18 in (30–45 cm) spacing a group of 5–7 plugs takes about 5–15 ft².
 * Species numbers grow far slower than area. From 250 ft² the mix holds the 9 flowering species
 * of a full CP42 planting (CP42-IN, R) plus the grasses and sedges of its grass share (objective.ts).
 */
const STEPS: readonly { fromSqFt: number; size: number }[] = [
  { fromSqFt: 10_000, size: 25 },
  { fromSqFt: 2_500, size: 20 },
  { fromSqFt: 1_000, size: 16 },
  { fromSqFt: 500, size: 13 },
  { fromSqFt: 250, size: 11 },
  { fromSqFt: 100, size: 7 },
  { fromSqFt: 50, size: 5 },
  { fromSqFt: 0, size: 3 },
];

export function mixSizeForArea(areaSqFt: number): { size: number; reason: string } {
  const step = STEPS.find((s) => areaSqFt >= s.fromSqFt) ?? STEPS[STEPS.length - 1];
  return {
    size: step.size,
    reason: `${formatArea(areaSqFt)} has room for about ${step.size} species, each in a group of several plants.`,
  };
}
