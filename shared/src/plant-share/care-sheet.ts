import type { Species } from '../types/species.js';
import { defaultSpacingIn, describeSpacing } from '../quantities/spacing.js';
import { CAUTION_WORDS } from '../vocabulary/caution-words.js';
import { MOISTURE_WORDS, SUN_WORDS } from '../vocabulary/site-words.js';
import type { CareSheetEntry } from './answers.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';

const list = (words: readonly string[]) =>
  words.length <= 1 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}`;

/** "Savia irritante: Su savia puede irritar… En la ficha (en inglés): Milky sap irritates eyes…". */
export function cautionInSpanish(words: { title: string; sentence: string }, recordText: string): string {
  return `${words.title}: ${words.sentence} En la ficha (en inglés): ${recordText}`;
}

/**
 * A short care sheet for one species, in words: where to plant it, how far apart, and its cautions
 * with the record's own sentence. Spacing is the default the quantities use (common practice).
 * In Spanish the words come from the shared Spanish tables, and each caution is said in Spanish
 * (its title and general sentence); the record's own, more specific sentence is in English only, so
 * it follows, marked as such, rather than being dropped: a caution is never made vaguer.
 */
export function careSheetFor(species: Species, locale: WordLocale = 'en'): CareSheetEntry {
  const spacing = describeSpacing(defaultSpacingIn(species));
  if (locale === 'es') {
    const w = wordsFor('es');
    const or = (words: readonly string[]) => w.join(words, 'or');
    return {
      speciesSlug: species.slug,
      commonName: species.commonNames[0],
      scientificName: species.scientificName,
      sun: `Mejor a ${or(species.sunOptimum.map((s) => w.sun[s]))}; crece a ${or(species.sun.map((s) => w.sun[s]))}.`,
      moisture: `Mejor en suelo ${or(species.moistureOptimum.map((m) => w.moisture[m]))}; crece en suelo ${or(species.moisture.map((m) => w.moisture[m]))}.`,
      spacing: `Planta a ${spacing.spacingIn} in (${Math.round(spacing.spacingCm)} cm) de distancia.`,
      cautions: species.cautions.map((c) => cautionInSpanish(w.caution[c.kind], c.text)),
    };
  }
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
