import type { RegionContext, Site } from '../types/site.js';
import { describeGround } from '../vocabulary/site-words.js';
import type { PaletteItem } from './palette-item.js';

/** What the constraint report looks at: the mix, and everything it could have been chosen from. */
export interface ConstraintInput {
  chosen: readonly PaletteItem[];
  /** Every species the mix could hold (suits the ground, native, not excluded). */
  candidates: readonly PaletteItem[];
  size: number;
  site: Site;
  region: RegionContext;
  locked: readonly string[];
  /** Native milkweeds that just miss the site, with the reason, for the monarch rule's words. */
  milkweedNearMisses: readonly { name: string; reason: string }[];
  /** Names of native milkweeds that suit the site but are protected, so never chosen automatically. */
  protectedMilkweeds?: readonly string[];
}

/** "dry shade" etc.: how reasons name the user's ground. */
export function groundWords(input: ConstraintInput): string {
  return describeGround(input.site.sun, input.site.moisture);
}

/** "Only 1 late bloomer native to your region suits dry shade" / "No … suit …" / "Only 2 … suit …". */
export function onlyAvailable(count: number, singular: string, plural: string, ground: string): string {
  if (count === 0) return `No ${singular} native to your region suits ${ground}`;
  return `Only ${count} ${count === 1 ? singular : plural} native to your region ${count === 1 ? 'suits' : 'suit'} ${ground}`;
}

/** Why the optimiser left out species that were available: the mix was full or locks took places. */
export function lostOut(input: ConstraintInput, what: string): string {
  const locks = input.locked.length > 0 ? ` (${input.locked.length} of them kept by you)` : '';
  return `${what} lost out to other needs in a mix of ${input.size} species${locks}; keep one in, or choose a larger mix.`;
}

export const names = (items: readonly PaletteItem[]) => items.map((i) => i.name);
