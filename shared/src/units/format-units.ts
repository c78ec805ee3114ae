import { cmToInches, roundTo, squareFeetToSquareMetres } from './conversions.js';

/**
 * Words with both unit systems side by side, as the voice guide asks ("24 in (61 cm)").
 * US first because our users measure yards in feet; metric in brackets.
 */

export function formatArea(areaSqFt: number): string {
  return `${trim(areaSqFt, 0)} ft² (${trim(squareFeetToSquareMetres(areaSqFt), 1)} m²)`;
}

/** Lengths under 90 cm read best in inches, taller ones in feet; tree sizes in feet and metres. */
export function formatHeightCm(cm: number): string {
  const inches = cmToInches(cm);
  if (cm < 90) return `${trim(inches, 0)} in (${trim(cm, 0)} cm)`;
  if (cm < 300) return `${trim(inches / 12, 1)} ft (${trim(cm, 0)} cm)`;
  return `${trim(inches / 12, 0)} ft (${trim(cm / 100, 1)} m)`;
}

export function formatHeightRangeCm(minCm: number, maxCm: number): string {
  const ft = (cm: number) => cmToInches(cm) / 12;
  if (maxCm < 90) return `${trim(cmToInches(minCm), 0)}–${trim(cmToInches(maxCm), 0)} in (${minCm}–${maxCm} cm)`;
  if (maxCm < 300) return `${trim(ft(minCm), 1)}–${trim(ft(maxCm), 1)} ft (${minCm}–${maxCm} cm)`;
  return `${trim(ft(minCm), 0)}–${trim(ft(maxCm), 0)} ft (${trim(minCm / 100, 1)}–${trim(maxCm / 100, 1)} m)`;
}

export function formatSpacingInches(inches: number): string {
  return `${trim(inches, 0)} in (${trim(inches * 2.54, 0)} cm)`;
}

function trim(value: number, decimals: number): string {
  return String(roundTo(value, decimals));
}
