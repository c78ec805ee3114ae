/**
 * Exact unit factors (international yard and pound, 1959). Homeground stores areas in ft² and
 * sizes in cm; these helpers convert at the edges so both unit systems can be shown side by side.
 */

/** 1 ft = 0.3048 m exactly, so 1 ft² = 0.09290304 m². */
export const SQUARE_METRES_PER_SQUARE_FOOT = 0.09290304;
/** 1 in = 2.54 cm exactly. */
export const CM_PER_INCH = 2.54;
/** 1 lb = 453.59237 g exactly. */
export const GRAMS_PER_POUND = 453.59237;
/** 1 oz (avoirdupois) = 1/16 lb. */
export const GRAMS_PER_OUNCE = GRAMS_PER_POUND / 16;
/** 1 acre = 43,560 ft² (definition of the acre). */
export const SQUARE_FEET_PER_ACRE = 43_560;
/** 1 ha = 10,000 m². */
export const SQUARE_METRES_PER_HECTARE = 10_000;

export function squareMetresToSquareFeet(areaSqM: number): number {
  return areaSqM / SQUARE_METRES_PER_SQUARE_FOOT;
}

export function squareFeetToSquareMetres(areaSqFt: number): number {
  return areaSqFt * SQUARE_METRES_PER_SQUARE_FOOT;
}

export function inchesToCm(inches: number): number {
  return inches * CM_PER_INCH;
}

export function cmToInches(cm: number): number {
  return cm / CM_PER_INCH;
}

export function gramsToOunces(grams: number): number {
  return grams / GRAMS_PER_OUNCE;
}

/** lb/acre → kg/ha: (g per lb ÷ 1000) ÷ (ha per acre). */
export function poundsPerAcreToKgPerHectare(lbPerAcre: number): number {
  const hectaresPerAcre = (SQUARE_FEET_PER_ACRE * SQUARE_METRES_PER_SQUARE_FOOT) / SQUARE_METRES_PER_HECTARE;
  return (lbPerAcre * GRAMS_PER_POUND) / 1000 / hectaresPerAcre;
}

/** A count per ft² expressed per m². */
export function perSquareFootToPerSquareMetre(perSqFt: number): number {
  return perSqFt / SQUARE_METRES_PER_SQUARE_FOOT;
}

/** Rounds to a fixed number of decimals, for display and stable comparisons. */
export function roundTo(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}
