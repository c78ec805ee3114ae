import type { Germination, SowingMethod, TreatmentStep } from '@homeground/shared';

/**
 * Seed treatments in plain words for fact cards, and in a few letters for pot labels.
 * The how-to wording is ordinary nursery practice (from-memory); the days and notes are the
 * species record's own (its `germination.treatments` source).
 */

const DEFAULT_NOTE: Partial<Record<TreatmentStep['kind'], string>> = {
  scarification: 'Nick or sand the seed coat (scarification) so water can get in.',
  'hot-water': 'Dip the seed in hot water, about 85 °C (185 °F), for 2 minutes, then drain.',
  inoculant: 'Coat the seed with the matching rhizobial inoculant just before sowing.',
};

function days(n: number | undefined): string {
  return n === undefined ? 'about 60 days' : `${n} days`;
}

/** One sentence per step, in the order the grower does them. */
export function treatmentSentences(germination: Pick<Germination, 'treatments'>): string[] {
  return germination.treatments.map((step) => {
    const note = step.note ? ` ${step.note}` : '';
    switch (step.kind) {
      case 'cold-moist':
        return `Cold-moist stratify ${days(step.days)}: mix seed with damp sand in a bag in the refrigerator.${note}`;
      case 'warm-moist':
        return `Warm-moist stratify ${days(step.days)}: keep seed in damp sand in a bag at room temperature.${note}`;
      case 'none':
        return step.note ?? 'No treatment needed: sow the seed as it comes.';
      default:
        return step.note ?? DEFAULT_NOTE[step.kind] ?? '';
    }
  });
}

/** A pot label's few letters: "CMS 60 d", "WMS 90 d + CMS 90 d", "scarify + inoculate". */
export function treatmentShort(germination: Pick<Germination, 'treatments' | 'needsLight' | 'sowingDepthMm'>): string {
  const steps = germination.treatments.map((step) => {
    switch (step.kind) {
      case 'cold-moist':
        return `CMS ${step.days ?? 60} d`;
      case 'warm-moist':
        return `WMS ${step.days ?? 60} d`;
      case 'scarification':
        return 'scarify';
      case 'hot-water':
        return 'hot water';
      case 'inoculant':
        return 'inoculate';
      default:
        return 'no treatment';
    }
  });
  const surface = germination.needsLight || germination.sowingDepthMm === 0 ? ' · surface sow' : '';
  return `${steps.join(' + ')}${surface}`;
}

/** Common inch fractions a grower measures with, nearest first. */
const INCH_FRACTIONS: [number, string][] = [
  [1 / 16, '1/16'], [1 / 8, '1/8'], [3 / 16, '3/16'], [1 / 4, '1/4'], [3 / 8, '3/8'], [1 / 2, '1/2'],
  [5 / 8, '5/8'], [3 / 4, '3/4'], [1, '1'], [1.5, '1 1/2'], [2, '2'], [3, '3'], [4, '4'],
];

function nearestInches(mm: number): string {
  const inches = mm / 25.4;
  let best = INCH_FRACTIONS[0];
  for (const f of INCH_FRACTIONS) if (Math.abs(f[0] - inches) < Math.abs(best[0] - inches)) best = f;
  return best[1];
}

/** Light and depth in one sentence, with millimetres and inches side by side. */
export function sowingDepthWords(germination: Pick<Germination, 'needsLight' | 'sowingDepthMm'>): string {
  if (germination.needsLight) return 'Needs light to sprout: press the seed onto the surface and do not cover it.';
  if (germination.sowingDepthMm === 0) return 'Surface sow: press the seed in and cover it barely, if at all.';
  return `Sow ${germination.sowingDepthMm} mm (${nearestInches(germination.sowingDepthMm)} in) deep.`;
}

export const METHOD_WORDS: Record<SowingMethod, string> = {
  'outdoor-pot-winter': 'outdoor pots over winter',
  'winter-sowing': 'winter sowing in covered containers',
  'indoor-lights': 'indoors under lights',
  'soil-blocks': 'soil blocks',
  'direct-seed': 'direct seeding',
};

export function methodsWords(methods: readonly SowingMethod[]): string {
  const words = methods.map((m) => METHOD_WORDS[m]);
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}`;
}
