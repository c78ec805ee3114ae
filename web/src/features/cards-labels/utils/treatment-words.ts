import { type Germination, treatmentBrief, treatmentShortWords } from '@homeground/shared';

/**
 * Seed treatments for fact cards and pot labels, in the shared vocabulary's words; the days and
 * notes are the species record's own (its `germination.treatments` source).
 */

/** One sentence per step, in the order the grower does them; a record's note follows its step. */
export function treatmentSentences(germination: Pick<Germination, 'treatments'>): string[] {
  return germination.treatments.map((step) => {
    if (step.kind === 'none' && step.note) return step.note;
    const brief = treatmentBrief(step);
    const isMoist = step.kind === 'cold-moist' || step.kind === 'warm-moist';
    if (!isMoist && step.note) return step.note;
    return step.note ? `${brief} ${step.note}` : brief;
  });
}

/** A pot label's few letters: "CMS 60 d", "WMS 90 d + CMS 90 d", "scarify + inoculate". */
export function treatmentShort(germination: Pick<Germination, 'treatments' | 'needsLight' | 'sowingDepthMm'>): string {
  const steps = germination.treatments.map(treatmentShortWords);
  const surface = germination.needsLight || germination.sowingDepthMm === 0 ? ' · surface sow' : '';
  return `${steps.join(' + ')}${surface}`;
}
