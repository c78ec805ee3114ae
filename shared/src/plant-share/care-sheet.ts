import type { Species } from '../types/species.js';
import { defaultSpacingIn, describeSpacing } from '../quantities/spacing.js';
import { CAUTION_WORDS } from '../vocabulary/caution-words.js';
import { MOISTURE_WORDS, SUN_WORDS } from '../vocabulary/site-words.js';
import type { CareSheetEntry } from './answers.js';

const list = (words: readonly string[]) =>
  words.length <= 1 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}`;

/**
 * A short care sheet for one species, in words: where to plant it, how far apart, and its cautions
 * with the record's own sentence. Spacing is the default the quantities use (common practice).
 */
export function careSheetFor(species: Species): CareSheetEntry {
  const spacing = describeSpacing(defaultSpacingIn(species));
  const best = species.sunOptimum.map((s) => SUN_WORDS[s]);
  const soil = species.moistureOptimum.map((m) => MOISTURE_WORDS[m]);
  return {
    speciesSlug: species.slug,
    commonName: species.commonNames[0],
    scientificName: species.scientificName,
    sun: `Best in ${list(best)}; grows in ${list(species.sun.map((s) => SUN_WORDS[s]))}.`,
    moisture: `Best in ${list(soil)} soil; grows in ${list(species.moisture.map((m) => MOISTURE_WORDS[m]))} soil.`,
    spacing: `Plant ${spacing.spacingIn} in (${Math.round(spacing.spacingCm)} cm) apart.`,
    cautions: species.cautions.map((c) => `${CAUTION_WORDS[c.kind].title}: ${c.text}`),
  };
}
