import type { RegionContext, Site } from '../types/site.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import { mixWordsFor, type MixWords } from './mix-words.js';
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
  /** The language of the details (English when absent). */
  locale?: WordLocale;
}

/** "dry shade" etc.: how reasons name the user's ground, in the report's language. */
export function groundWords(input: ConstraintInput): string {
  return wordsFor(input.locale ?? 'en').describeGround(input.site.sun, input.site.moisture);
}

/** The report's sentences in its language. */
export function wordsOf(input: ConstraintInput): MixWords {
  return mixWordsFor(input.locale);
}

/** Species names joined in the report's language ("A, B and C" / "A, B y C"). */
export function namesOf(input: ConstraintInput, items: readonly PaletteItem[]): string {
  return wordsFor(input.locale ?? 'en').join(items.map((i) => i.name));
}
