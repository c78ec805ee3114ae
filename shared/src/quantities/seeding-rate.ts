import {
  SQUARE_FEET_PER_ACRE,
  perSquareFootToPerSquareMetre,
  poundsPerAcreToKgPerHectare,
} from '../units/conversions.js';
import { seedWeight, type SeedWeight } from './seed-count.js';

/**
 * Direct seeding: seeds/ft² = lb PLS/acre × seeds/lb ÷ 43,560 (definition of the acre, X;
 * CHECK-VALUES §3). PLS (pure live seed) rates already allow for purity and germination.
 */
export function seedsPerSqFtFromRate(lbPlsPerAcre: number, seedsPerPound: number): number {
  return (lbPlsPerAcre * seedsPerPound) / SQUARE_FEET_PER_ACRE;
}

/** The same identity the other way: lb PLS/acre = seeds/ft² × 43,560 ÷ seeds/lb. */
export function rateFromSeedsPerSqFt(seedsPerSqFt: number, seedsPerPound: number): number {
  return (seedsPerSqFt * SQUARE_FEET_PER_ACRE) / seedsPerPound;
}

export interface DirectSeeding {
  lbPlsPerAcre: number;
  kgPlsPerHectare: number;
  seedsPerSqFt: number;
  seedsPerSqM: number;
  /** PLS needed for the area. */
  seed: SeedWeight;
}

/** A seeding rate for an area in both unit systems, with the PLS weight to buy or collect. */
export function directSeeding(lbPlsPerAcre: number, seedsPerPound: number, areaSqFt: number): DirectSeeding {
  const seedsPerSqFt = seedsPerSqFtFromRate(lbPlsPerAcre, seedsPerPound);
  return {
    lbPlsPerAcre,
    kgPlsPerHectare: poundsPerAcreToKgPerHectare(lbPlsPerAcre),
    seedsPerSqFt,
    seedsPerSqM: perSquareFootToPerSquareMetre(seedsPerSqFt),
    seed: seedWeight(seedsPerSqFt * areaSqFt, seedsPerPound),
  };
}
