import { type TreatmentStep, type Vocabulary, wordsFor } from '@homeground/shared';

export interface GuidanceStep {
  title: string;
  body: string;
  /** The record's own note for this step, in the curator's words. */
  note?: string;
}

/** One treatment step as the species page lists it: the shared title and how-to, then the record's note. */
export function treatmentWords(step: TreatmentStep, words: Vocabulary = wordsFor('en')): GuidanceStep {
  return { title: words.treatmentTitle(step), body: words.treatmentHow(step), note: step.note };
}
