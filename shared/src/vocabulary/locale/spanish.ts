import { MOISTURE_LEVELS, SOIL_TEXTURES, SUN_LEVELS, type Moisture, type Sun } from '../../types/species.js';
import { capitalise } from '../join-words.js';
import { monthRuns } from '../months.js';
import { DEFAULT_MOIST_DAYS } from '../seed-words.js';
import { mmToInchWords } from '../sowing-depth.js';
import { SPANISH_WORDS as W } from './spanish-words.js';
import type { Vocabulary } from './vocabulary.js';

// Intl.ListFormat knows Spanish's own joins ("y"/"o", "e" before an i-sound, "u" before an o-sound).
const AND = new Intl.ListFormat('es', { type: 'conjunction' });
const OR = new Intl.ListFormat('es', { type: 'disjunction' });

function join(words: readonly string[], conjunction: 'and' | 'or' = 'and'): string {
  return (conjunction === 'and' ? AND : OR).format(words);
}

function inOrder<T extends string>(values: readonly T[], order: readonly T[], words: Record<T, string>): string[] {
  return order.filter((v) => values.includes(v)).map((v) => words[v]);
}

function formatMonths(months: readonly number[]): string {
  const runs = monthRuns(months);
  if (runs.length === 1 && runs[0][0] === 1 && runs[0][1] === 12) return 'todo el año';
  const short = (m: number) => W.month[m as keyof typeof W.month].short;
  return join(runs.map(([a, b]) => (a === b ? short(a) : `${short(a)}–${short(b)}`)));
}

type Step = Parameters<Vocabulary['treatmentTitle']>[0];
const isMoist = (kind: Step['kind']) => kind === 'cold-moist' || kind === 'warm-moist';

function weeksWords(days: number): string {
  const w = Math.round(days / 7);
  return w <= 1 ? 'más o menos una semana' : `unas ${w} semanas`;
}

function treatmentTitle(step: Step): string {
  const name = W.treatment[step.kind].name;
  return isMoist(step.kind) ? `${name}, ${step.days ?? DEFAULT_MOIST_DAYS} días` : name;
}

function treatmentHow(step: Step): string {
  const days = step.days ?? DEFAULT_MOIST_DAYS;
  const when = `${days} días (${weeksWords(days)})`;
  switch (step.kind) {
    case 'cold-moist':
      return (
        `${W.treatment['cold-moist'].how} Guárdala en el refrigerador, no en el congelador, durante ${when}, ` +
        'revisando de vez en cuando que siga húmeda. Sembrar afuera a finales del otoño o en invierno hace el mismo trabajo.'
      );
    case 'warm-moist':
      return `${W.treatment['warm-moist'].how} durante ${when} antes del siguiente paso.`;
    default:
      return W.treatment[step.kind].how;
  }
}

/** Spanish: the tables in spanish-words.ts and phrases in Spanish word order ("suelo seco o fresco"). */
export const SPANISH_VOCABULARY: Vocabulary = {
  locale: 'es',
  ...W,
  join,
  formatMonths,
  bloomWords: (months) => {
    const range = formatMonths(months);
    return range === '' ? 'Sin meses de floración registrados' : `Florece ${range}`;
  },
  sunPhrase: (sun) => capitalise(join(inOrder(sun, SUN_LEVELS, W.sun), 'or')),
  moisturePhrase: (moisture) => `Suelo ${join(inOrder(moisture, MOISTURE_LEVELS, W.moisture), 'or')}`,
  soilPhrase: (soils) => capitalise(join(inOrder(soils, SOIL_TEXTURES, W.soilTexture), 'or')),
  describeGround: (sun: Sun, moisture: Moisture) => `${W.sun[sun]} y suelo ${W.moisture[moisture]}`,
  siteShortWords: (sun, moisture) =>
    [inOrder(sun, SUN_LEVELS, W.sun).join('/'), inOrder(moisture, MOISTURE_LEVELS, W.moisture).join('/')]
      .filter((part) => part !== '')
      .join(' · '),
  cautionList: (kinds) => kinds.map((k) => W.caution[k].title.toLowerCase()).join(', '),
  habitLine: (words) => `${words.label}: ${words.line}`,
  weeksWords,
  treatmentTitle,
  treatmentBrief: (step) =>
    isMoist(step.kind) ? `${treatmentTitle(step)}: ${W.treatment[step.kind].brief}` : W.treatment[step.kind].brief,
  treatmentShortWords: (step) =>
    isMoist(step.kind)
      ? `${W.treatment[step.kind].short} ${step.days ?? DEFAULT_MOIST_DAYS} d`
      : W.treatment[step.kind].short,
  treatmentHow,
  sowingDepthSentence: (g) => {
    if (g.needsLight) {
      return g.sowingDepthMm > 0
        ? `Necesita luz para germinar: siembra en la superficie, presionando la semilla contra la tierra. Cúbrela con no más de ${g.sowingDepthMm} mm (apenas un polvito) de arenilla fina.`
        : 'Necesita luz para germinar: siembra en la superficie. Presiona la semilla contra la tierra y no la cubras.';
    }
    if (g.sowingDepthMm === 0) return 'Siembra en la superficie, presionando la semilla contra la tierra.';
    return `Siembra a ${g.sowingDepthMm} mm (${mmToInchWords(g.sowingDepthMm).replace(' in', ' pulg.')}) de profundidad.`;
  },
  sowingMethodsPhrase: (methods, conjunction = 'or') =>
    join(
      methods.map((m) => W.sowingMethod[m].phrase),
      conjunction,
    ),
  ecoregionFoundWords: ({ ecoregion, zip }) => {
    const { method, name, share } = ecoregion;
    const lead = capitalise(W.ecoregionMethod[method]);
    if (method === 'boundary') {
      const where = zip ? 'el centro de tu código postal' : 'tu punto';
      return `${lead}: ${where} queda dentro del contorno de la EPA de ${name}.`;
    }
    if (share !== null && share >= 0.995) return `${lead}: todo tu condado está en ${name}.`;
    const about = share === null ? '' : ` (más o menos el ${Math.round(share * 100)} %)`;
    return `${lead}: tu condado está casi todo en ${name}${about}. Cerca de un borde tu terreno puede estar en otra; elígela abajo si lo sabes.`;
  },
};
