import { type Germination, type Vocabulary, wordsFor } from '@homeground/shared';

/**
 * Seed treatments for fact cards and pot labels, in the shared vocabulary's words; the days and
 * notes are the species record's own (its `germination.treatments` source).
 */

/** One sentence per step, in the order the grower does them; a record's note follows its step. */
export function treatmentSentences(
  germination: Pick<Germination, 'treatments'>,
  words: Vocabulary = wordsFor('en'),
): string[] {
  return germination.treatments.map((step) => {
    const brief = words.treatmentBrief(step);
    // A record's notes are written in English: a card in another language keeps to its own words.
    if (words.locale !== 'en') return brief;
    if (step.kind === 'none' && step.note) return step.note;
    const isMoist = step.kind === 'cold-moist' || step.kind === 'warm-moist';
    if (!isMoist && step.note) return step.note;
    return step.note ? `${brief} ${step.note}` : brief;
  });
}

/** A pot label's few letters: "CMS 60 d", "WMS 90 d + CMS 90 d", "scarify + inoculate". */
export function treatmentShort(
  germination: Pick<Germination, 'treatments' | 'needsLight' | 'sowingDepthMm'>,
  words: Vocabulary = wordsFor('en'),
  surfaceSow = 'surface sow',
): string {
  const steps = germination.treatments.map((step) => words.treatmentShortWords(step));
  const surface = germination.needsLight || germination.sowingDepthMm === 0 ? ` · ${surfaceSow}` : '';
  return `${steps.join(' + ')}${surface}`;
}
