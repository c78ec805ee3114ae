import { type Vocabulary, wordsFor } from '@homeground/shared';
import { useLocale } from './use-locale.js';

/** The shared word tables and phrases in the page's language (`useWords().sun.part`). */
export function useWords(): Vocabulary {
  return wordsFor(useLocale().locale);
}
