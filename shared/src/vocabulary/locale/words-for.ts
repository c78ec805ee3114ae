import { ENGLISH_VOCABULARY } from './english.js';
import { SPANISH_VOCABULARY } from './spanish.js';
import type { Vocabulary, WordLocale } from './vocabulary.js';

const VOCABULARIES = { en: ENGLISH_VOCABULARY, es: SPANISH_VOCABULARY } as const satisfies Record<
  WordLocale,
  Vocabulary
>;

/** The word tables and phrases of a language: `wordsFor('es').sun.part` → "media sombra". */
export function wordsFor(locale: WordLocale): Vocabulary {
  return VOCABULARIES[locale];
}
