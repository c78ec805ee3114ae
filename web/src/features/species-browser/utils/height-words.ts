import { cmToInches, roundTo } from '@homeground/shared';

/** "2.5 ft"; heights in the browser read in feet so a column of them compares at a glance. */
export function formatFeet(cm: number): string {
  return `${roundTo(cmToInches(cm) / 12, 1)} ft`;
}

export function formatCm(cm: number): string {
  return `${roundTo(cm, 0)} cm`;
}

/**
 * A height range in feet with metric beside it (DESIGN.md voice): "1–2.5 ft (30–75 cm)", and
 * metres once a plant passes 3 m so tree heights stay short: "49–82 ft (15–25 m)".
 */
export function formatHeightRangeFeet(minCm: number, maxCm: number): string {
  const { feet, metric } = heightRangeParts(minCm, maxCm);
  return `${feet} (${metric})`;
}

/** The two halves of a height range, for a cell that puts metric on its own line. */
export function heightRangeParts(minCm: number, maxCm: number): { feet: string; metric: string } {
  const ft = (cm: number) => roundTo(cmToInches(cm) / 12, cm >= 300 ? 0 : 1);
  const feet = minCm === maxCm ? `${ft(minCm)} ft` : `${ft(minCm)}–${ft(maxCm)} ft`;
  if (maxCm >= 300) {
    const m = (cm: number) => roundTo(cm / 100, 1);
    return { feet, metric: `${minCm === maxCm ? m(minCm) : `${m(minCm)}–${m(maxCm)}`} m` };
  }
  return { feet, metric: `${minCm === maxCm ? minCm : `${minCm}–${maxCm}`} cm` };
}
