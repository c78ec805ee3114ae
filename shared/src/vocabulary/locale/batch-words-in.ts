import type { GrowerMethod } from '../../types/batch.js';
import { BATCH_CAUTIONS, BATCH_STEP_WORDS, FROST_NIGHT_WORDS, type BatchStepKind } from '../batch-words.js';
import type { WordLocale } from './vocabulary.js';

/**
 * The batch words the API answers with (My batches), in each language: step titles, the frost
 * watch, the "behind" notes, the outdoor stratifying sentence and the cautions for the work.
 * Whole sentences with their values interpolated; the Spanish keeps the plain, warm voice (tú).
 */
export interface BatchWords {
  step: Record<BatchStepKind, string>;
  frostNight: Record<GrowerMethod, string>;
  /** "Frost watch until 2027-05-25: … {what to do}. Check your local forecast." */
  frostWatch(until: string, method: GrowerMethod): string;
  notSownYet(firstStep: string, date: string): string;
  nothingUpYet(date: string): string;
  winterStratifies: string;
  noLongerInCatalogue(slug: string): string;
  cautions: readonly string[];
}

const EN: BatchWords = {
  step: BATCH_STEP_WORDS,
  frostNight: FROST_NIGHT_WORDS,
  frostWatch: (until, method) =>
    `Frost watch until ${until}: a late frost is still possible. On clear, still nights when frost is forecast, ${FROST_NIGHT_WORDS[method]}. Check your local forecast.`,
  notSownYet: (first, date) =>
    `Not sown yet: the usual start (${first.toLowerCase()}) was ${date}. Start as soon as you can.`,
  nothingUpYet: (date) => `Nothing logged as up yet, though seedlings were expected before ${date}.`,
  winterStratifies:
    'Winter does it: sown outdoors in late fall or winter, the seed gets its cold, moist days in the container.',
  noLongerInCatalogue: (slug) => `"${slug}" is no longer in the catalogue, so this batch has no dates.`,
  cautions: BATCH_CAUTIONS,
};

const ES_FROST_NIGHT: Record<GrowerMethod, string> = {
  'winter-sowing': 'cierra las tapas de los recipientes antes de que anochezca',
  'outdoor-pot-winter': 'cubre las macetas con manta antiheladas o una sábana vieja, o arrímalas a la casa',
  'indoor-lights': 'mete en casa por la noche las plántulas que se están aclimatando',
  'soil-blocks': 'mete en casa por la noche los bloques que se están aclimatando',
};

const ES: BatchWords = {
  step: {
    'start-warm': 'Empieza la estratificación cálida y húmeda',
    'start-stratifying': 'Empieza a estratificar en el refrigerador',
    'check-sprouts': 'Revisa si la semilla ha brotado',
    sow: 'Siembra',
    'vent-containers': 'Abre los recipientes los días templados y ciérralos antes de una helada',
    'sprouts-expected': 'Brotes esperados',
    'pot-up': 'Pasa a maceta',
    'harden-off': 'Aclimata las plantas (hardening off)',
    'frost-watch': 'Vigilancia de heladas: protege de una helada tardía',
    ready: 'Lista para dar',
  },
  frostNight: ES_FROST_NIGHT,
  frostWatch: (until, method) =>
    `Vigilancia de heladas hasta el ${until}: todavía puede caer una helada tardía. Las noches despejadas y sin viento en que se anuncie helada, ${ES_FROST_NIGHT[method]}. Revisa el pronóstico de tu zona.`,
  notSownYet: (first, date) =>
    `Todavía sin sembrar: lo normal era empezar (${first.toLowerCase()}) el ${date}. Empieza en cuanto puedas.`,
  nothingUpYet: (date) => `Aún no has anotado nada que haya brotado, aunque se esperaban plántulas antes del ${date}.`,
  winterStratifies:
    'El invierno lo hace por ti: sembrada al aire libre a finales del otoño o en invierno, la semilla recibe sus días fríos y húmedos en el recipiente.',
  noLongerInCatalogue: (slug) => `"${slug}" ya no está en el catálogo, así que este lote no tiene fechas.`,
  cautions: [
    'La mezcla para macetas seca, la mezcla para bloques de tierra y la vermiculita sueltan polvo: humedécelas antes de usarlas, y trabaja al aire libre o ponte una mascarilla contra el polvo.',
    'Usa guantes al manejar la mezcla para macetas y lávate las manos después.',
    'Guarda la semilla que se estratifica en el refrigerador cerrada y etiquetada, lejos de la comida y fuera del alcance de los niños.',
  ],
};

const BATCH_WORDS: Record<WordLocale, BatchWords> = { en: EN, es: ES };

/** The batch words of a language (English when none is given). */
export function batchWordsFor(locale: WordLocale = 'en'): BatchWords {
  return BATCH_WORDS[locale];
}
