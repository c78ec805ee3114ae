import { readinessOf } from '../sowing-calendar/readiness.js';
import { stratificationOf } from '../sowing-calendar/treatments.js';
import type { GrowerMethod } from '../types/batch.js';
import type { Species } from '../types/species.js';

/** How well a method suits a species' seed, best first; `why` says it in words. */
export interface MethodFit {
  fits: boolean;
  /** 0 is the method to prefer; larger is less suited. Used only to order, never shown. */
  rank: number;
  why: string;
}

/** Cold-moist need from which outdoor methods are preferred: about 60 d (IPN, R, CHECK-VALUES §4). */
export const LONG_COLD_DAYS = 60;

const OUTDOOR: readonly GrowerMethod[] = ['outdoor-pot-winter', 'winter-sowing'];

/**
 * Whether a method suits a species, from its record's methods and its seed treatments (common
 * practice among native-plant growers, from memory): long cold-moist stratification, warm-then-cold
 * or double dormancy suit outdoor methods, where winter does the work; seed that needs warm soil,
 * no cold or only scarification suits indoor sowing, where the warmth is steady.
 */
export function methodFit(species: Species, method: GrowerMethod): MethodFit {
  if (!species.germination.methods.includes(method))
    return { fits: false, rank: 9, why: 'its record does not list this method' };
  const s = stratificationOf(species);
  const r = readinessOf(species);
  const outdoor = OUTDOOR.includes(method);
  if (s.warmDays > 0 || r.doubleDormancy)
    return outdoor
      ? { fits: true, rank: 0, why: 'it needs warm then cold, which the seasons give outdoors' }
      : { fits: true, rank: 3, why: 'it needs warm then cold: indoors that means months of stratifying first' };
  if (s.coldDays >= LONG_COLD_DAYS)
    return outdoor
      ? {
          fits: true,
          rank: method === 'winter-sowing' ? 0 : 1,
          why: `winter gives its ${s.coldDays} days of cold-moist stratification`,
        }
      : { fits: true, rank: 2, why: `indoors it needs ${s.coldDays} days in the refrigerator first` };
  if (r.needsWarmSoil)
    return outdoor
      ? { fits: true, rank: 2, why: 'outdoors it waits for warm soil to sprout' }
      : { fits: true, rank: 0, why: 'it sprouts in warmth, which indoor sowing gives' };
  if (s.coldDays > 0)
    return outdoor
      ? { fits: true, rank: 1, why: `winter gives its ${s.coldDays} days of cold-moist stratification` }
      : { fits: true, rank: 1, why: `a short ${s.coldDays} days in the refrigerator, then it sprouts under lights` };
  // No cold need (none, scarification, hot water): indoors it is quick and sure; outdoors fine too.
  return outdoor
    ? { fits: true, rank: 1, why: 'it needs no cold, so outdoors it simply waits for spring' }
    : { fits: true, rank: 0, why: 'it needs no cold, so it can be sown indoors and grown on quickly' };
}
