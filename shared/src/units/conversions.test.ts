import { describe, expect, it } from 'vitest';
import {
  cmToInches,
  gramsToOunces,
  poundsPerAcreToKgPerHectare,
  squareFeetToSquareMetres,
  squareMetresToSquareFeet,
} from './conversions.js';
import { formatArea, formatHeightCm, formatHeightRangeCm } from './format-units.js';

// Factors are the exact 1959 international yard and pound definitions (X: definitions).
describe('unit conversions (exact definitions)', () => {
  it.each([
    ['1 m² in ft²', squareMetresToSquareFeet(1), 10.7639],
    ['100 ft² in m²', squareFeetToSquareMetres(100), 9.2903],
    ['100 cm in inches', cmToInches(100), 39.3701],
    ['453.59237 g in oz', gramsToOunces(453.59237), 16],
    ['1 lb/acre in kg/ha', poundsPerAcreToKgPerHectare(1), 1.1209],
  ])('%s', (_what, actual, expected) => {
    expect(actual).toBeCloseTo(expected, 3);
  });

  it('round-trips an area', () => {
    expect(squareFeetToSquareMetres(squareMetresToSquareFeet(18.5))).toBeCloseTo(18.5, 10);
  });
});

describe('formatting with both unit systems (DESIGN.md voice)', () => {
  it.each([
    [formatArea(200), '200 ft² (18.6 m²)'],
    [formatHeightCm(60), '24 in (60 cm)'],
    [formatHeightCm(150), '4.9 ft (150 cm)'],
    [formatHeightRangeCm(30, 75), '12–30 in (30–75 cm)'],
    [formatHeightRangeCm(90, 150), '3–4.9 ft (90–150 cm)'],
    [formatHeightCm(1000), '33 ft (10 m)'],
    [formatHeightRangeCm(1500, 2500), '49–82 ft (15–25 m)'],
  ])('%s', (actual, expected) => {
    expect(actual).toBe(expected);
  });
});
