import type { GrowerCapacity, GrowerMethod } from '../types/batch.js';
import type { Species } from '../types/species.js';
import { SOWING_METHOD_WORDS, sowingMethodsPhrase } from '../vocabulary/seed-words.js';
import { plantsIn, unitsFor } from './batch-units.js';
import { methodFit } from './method-fit.js';

/** A grower as the split sees them: their methods and how many units each holds. */
export interface SplitGrower {
  growerId: string;
  methods: readonly GrowerCapacity[];
}

export interface SplitTarget {
  species: Species;
  targetPlants: number;
}

/** One batch the split proposes: a grower raises plants of a species by a method. */
export interface ProposedBatch {
  growerId: string;
  slug: string;
  method: GrowerMethod;
  plants: number;
  /** Pots, containers or blocks the batch takes of the grower's capacity. */
  units: number;
  /** Why this method, in words. */
  why: string;
}

/** Plants of a target the split could not place, and why. */
export interface UnassignedPlants {
  slug: string;
  plants: number;
  reason: string;
}

export interface BatchSplitProposal {
  batches: ProposedBatch[];
  unassigned: UnassignedPlants[];
}

const key = (growerId: string, method: GrowerMethod) => `${growerId}|${method}`;

/**
 * Splits a season's targets into batches per grower. Each species goes to the methods that suit
 * its seed best (`methodFit`), to the grower with the most room left for that method, and spills
 * over to the next grower or method when full. Species with the fewest places to go are placed
 * first, so an outdoor-only species is not crowded out. A grower's capacity per method is never
 * exceeded; every plant of every target is either in a batch or listed as unassigned with why.
 * Pure and deterministic: same input, same split.
 */
export function proposeBatchSplit(
  targets: readonly SplitTarget[],
  growers: readonly SplitGrower[],
): BatchSplitProposal {
  const room = new Map<string, number>();
  for (const g of growers) for (const m of g.methods) room.set(key(g.growerId, m.method), m.capacity);
  const options = (species: Species) =>
    growers.flatMap((g, gi) =>
      g.methods.flatMap((m) => {
        const fit = methodFit(species, m.method);
        return fit.fits ? [{ growerId: g.growerId, gi, method: m.method, fit }] : [];
      }),
    );
  const order = targets
    .map((t, i) => ({ t, i, choices: options(t.species).length }))
    .sort((a, b) => a.choices - b.choices || b.t.targetPlants - a.t.targetPlants || a.i - b.i);

  const batches: ProposedBatch[] = [];
  const unassigned: UnassignedPlants[] = [];
  for (const { t } of order) {
    let left = t.targetPlants;
    const choices = options(t.species);
    while (left > 0) {
      // Best-suited method first, then the grower with most room, then the growers' order.
      const next = choices
        .map((c) => ({ ...c, room: room.get(key(c.growerId, c.method)) ?? 0 }))
        .filter((c) => plantsIn(c.method, c.room) > 0)
        .sort((a, b) => a.fit.rank - b.fit.rank || b.room - a.room || a.gi - b.gi)[0];
      if (!next) break;
      const plants = Math.min(left, plantsIn(next.method, next.room));
      const units = unitsFor(next.method, plants);
      room.set(key(next.growerId, next.method), next.room - units);
      const same = batches.find(
        (b) => b.growerId === next.growerId && b.slug === t.species.slug && b.method === next.method,
      );
      if (same) {
        same.plants += plants;
        same.units = unitsFor(next.method, same.plants);
      } else {
        batches.push({
          growerId: next.growerId,
          slug: t.species.slug,
          method: next.method,
          plants,
          units,
          why: `${SOWING_METHOD_WORDS[next.method].phrase}: ${next.fit.why}.`,
        });
      }
      left -= plants;
    }
    if (left > 0) {
      unassigned.push({
        slug: t.species.slug,
        plants: left,
        reason:
          choices.length === 0
            ? `No grower uses a method that suits it; its record lists ${sowingMethodsPhrase(t.species.germination.methods)}.`
            : 'The growers who can raise it have no room left: ask a grower for more pots or containers, or lower the target.',
      });
    }
  }
  return { batches, unassigned };
}
