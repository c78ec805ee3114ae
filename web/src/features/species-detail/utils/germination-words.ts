import type { Germination, SowingMethod, TreatmentStep } from '@homeground/shared';

export interface GuidanceStep {
  title: string;
  body: string;
  /** The record's own note for this step, in the curator's words. */
  note?: string;
}

function weeks(days: number): string {
  const w = Math.round(days / 7);
  return w <= 1 ? 'about a week' : `about ${w} weeks`;
}

/** One treatment step in plain words, with the household way of doing it. */
export function treatmentWords(step: TreatmentStep): GuidanceStep {
  const note = step.note;
  switch (step.kind) {
    case 'none':
      return { title: 'No pre-treatment needed', body: 'Sow the seed as it comes.', note };
    case 'cold-moist':
      return {
        title: `Cold-moist stratification, ${step.days} days`,
        body:
          `Mix the seed with a little damp sand, or fold it into a damp paper towel, and seal it in a labelled bag. ` +
          `Keep it in the refrigerator, not the freezer, for ${step.days} days (${weeks(step.days ?? 0)}), checking now and then that it stays damp. ` +
          'Sowing outdoors in late fall or winter does the same job.',
        note,
      };
    case 'warm-moist':
      return {
        title: `Warm-moist stratification, ${step.days} days`,
        body: `Keep the seed in damp sand or a damp paper towel at room temperature for ${step.days} days (${weeks(step.days ?? 0)}) before the next step.`,
        note,
      };
    case 'scarification':
      return {
        title: 'Scarification',
        body: 'The seed coat is hard. Rub it with fine sandpaper or nick it with a nail file, just through the coat, so water can get in.',
        note,
      };
    case 'hot-water':
      return {
        title: 'Hot-water soak',
        body: 'Pour water just off the boil over the seed and leave it to soak overnight as it cools. Sow the seeds that have swelled.',
        note,
      };
    case 'inoculant':
      return {
        title: 'Inoculant',
        body: 'Just before sowing, coat the damp seed with the rhizobium inoculant made for this plant group, so the roots can fix nitrogen.',
        note,
      };
  }
}

const FRACTIONS: Record<number, string> = { 1: '⅛', 2: '¼', 3: '⅜', 4: '½', 5: '⅝', 6: '¾', 7: '⅞' };

/** Millimetres as inches the way a ruler reads them: to the nearest eighth ("¼ in", "1 in"). */
export function mmToInchWords(mm: number): string {
  const eighths = Math.max(1, Math.round(mm / 3.175));
  const whole = Math.floor(eighths / 8);
  const rest = eighths % 8;
  if (rest === 0) return `${whole} in`;
  return whole === 0 ? `${FRACTIONS[rest]} in` : `${whole} ${FRACTIONS[rest]} in`;
}

/** Where the seed goes: surface sown when it needs light, otherwise the depth in mm and inches. */
export function sowingDepthWords(g: Pick<Germination, 'needsLight' | 'sowingDepthMm'>): string {
  if (g.needsLight) {
    return g.sowingDepthMm > 0
      ? `Needs light to germinate: surface sow, pressing the seed onto the soil. Cover with no more than ${g.sowingDepthMm} mm (a dusting) of fine grit.`
      : 'Needs light to germinate: surface sow. Press the seed onto the soil and do not cover it.';
  }
  if (g.sowingDepthMm === 0) return 'Surface sow, pressing the seed onto the soil.';
  return `Sow ${g.sowingDepthMm} mm (${mmToInchWords(g.sowingDepthMm)}) deep.`;
}

/** The five ways Homeground's growers raise plants, as the trade names them. */
export const METHOD_WORDS: Record<SowingMethod, { name: string; how: string }> = {
  'outdoor-pot-winter': { name: 'Outdoor pots over winter', how: 'Sow in pots in late fall and leave them outside; winter does the chilling.' },
  'winter-sowing': { name: 'Covered-container winter sowing', how: 'Sow in covered containers with air and drainage holes, set outside in winter.' },
  'indoor-lights': { name: 'Indoor under lights', how: 'Sow indoors after any treatment, grow on under lights, then harden off.' },
  'soil-blocks': { name: 'Soil blocks', how: 'Sow into pressed blocks of compost; roots stop at the air and transplant without a pot.' },
  'direct-seed': { name: 'Direct seeding', how: 'Sow straight into prepared ground, usually in late fall.' },
};
