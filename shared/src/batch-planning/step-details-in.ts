import type { Species } from '../types/species.js';
import { SOWING_METHOD_WORDS } from '../vocabulary/seed-words.js';
import { sowingDepthSentence } from '../vocabulary/sowing-depth.js';
import type { WordLocale } from '../vocabulary/locale/vocabulary.js';
import { wordsFor } from '../vocabulary/locale/words-for.js';
import { type SentenceRule, sentenceTable } from '../vocabulary/locale/sentence-table.js';

/**
 * A batch step's "what to do" in the reader's language.
 *
 * The sowing calendar writes its details in English, as several whole sentences built from its
 * values (days, dates, depths); the calendar also feeds the CSV and iCalendar exports, so its words
 * are said again here rather than threaded through it. Each English sentence has its Spanish twin
 * below, the values taken over; a sentence without a twin (a species' own note from the catalogue)
 * stays as written, so nothing a grower needs is dropped. English passes through unchanged.
 */

/** Sentences that never change, word for word. */
const FIXED: Record<string, string> = {
  'Mix the seed with 2–3 times its volume of damp sand or vermiculite (damp, not dripping when squeezed), or fold it in a damp paper towel.':
    'Mezcla la semilla con 2 a 3 veces su volumen de arena o vermiculita húmeda (húmeda, sin que gotee al apretarla), o envuélvela en papel de cocina húmedo.',
  'This seed stratifies better in light: use a clear bag or lidded tray and keep it where light reaches it (under a lamp in a cold room or a refrigerator that stays lit), not in the dark.':
    'Esta semilla se estratifica mejor con luz: usa una bolsa transparente o una bandeja con tapa y ponla donde le llegue la luz (bajo una lámpara en un cuarto frío o en un refrigerador que quede iluminado), no a oscuras.',
  'Look every few days from now on, and sow at once any seed that has sprouted.':
    'Revisa cada pocos días a partir de ahora y siembra enseguida la semilla que haya brotado.',
  'Set each mini block into a 2 in (5 cm) block once roots show at the sides.':
    'Pon cada minibloque en un bloque de 2 in (5 cm) en cuanto asomen raíces por los lados.',
  'Blocks go out whole, with no root disturbance, so the plants skip the setback of transplanting and are ready about a week sooner.':
    'Los bloques salen enteros, sin tocar las raíces, así que las plantas se ahorran el bajón del trasplante y están listas una semana antes, más o menos.',
  'Move each seedling into its own 3–4 in (8–10 cm) pot once it has its first true leaves.':
    'Pasa cada plántula a su propia maceta de 3–4 in (8–10 cm) cuando tenga sus primeras hojas verdaderas.',
  'Set the plants outside in shade for 1–2 hours on the first day and add about an hour each day, then move them into sun.':
    'Saca las plantas a la sombra 1–2 horas el primer día y añade más o menos una hora cada día; después pásalas al sol.',
  'Bring them in if frost threatens.': 'Mételas en casa si amenaza helada.',
  'This is the average date: about half of years still bring a later frost.':
    'Esta es la fecha promedio: más o menos la mitad de los años todavía trae una helada más tarde.',
  'For two weeks, keep frost cloth or old sheets handy and cover young plants on clear, still nights when frost is forecast.':
    'Durante dos semanas, ten a mano manta antiheladas o sábanas viejas y cubre las plantas jóvenes las noches despejadas y sin viento en que se anuncie helada.',
  'Plants go out when the watch ends.': 'Las plantas salen cuando termina la vigilancia.',
  'Winter sowing: sow in covered containers (lidded trays or milk jugs with drainage holes and air holes), set outside in sun, snow and rain.':
    'Siembra de invierno: siembra en recipientes cubiertos (bandejas con tapa o garrafas de leche con agujeros de drenaje y de aire), puestos afuera al sol, la nieve y la lluvia.',
  'Winter gives the seed its cold-moist stratification.':
    'El invierno le da a la semilla su estratificación fría y húmeda.',
  'Sow in pots of damp mix and set them outside for the winter, on the ground against a wall, under mesh against mice and squirrels.':
    'Siembra en macetas con mezcla húmeda y déjalas afuera todo el invierno, en el suelo junto a una pared, bajo una malla contra ratones y ardillas.',
  'Seedlings come up as the containers warm; keep them damp, never soggy.':
    'Las plántulas salen cuando se templan los recipientes; mantenlas húmedas, nunca encharcadas.',
  'Tease the clump apart and move each seedling into its own cell or pot once it has true leaves.':
    'Separa con cuidado el montoncito y pasa cada plántula a su propia celda o maceta cuando tenga hojas verdaderas.',
  'Where several seedlings share a pot, ease them apart and give each its own 3–4 in (8–10 cm) pot once it has true leaves.':
    'Donde varias plántulas compartan maceta, sepáralas con cuidado y dale a cada una su propia maceta de 3–4 in (8–10 cm) cuando tenga hojas verdaderas.',
  'Open covered containers on warm days (highs around 70–75 °F / 21–24 °C) and close them again before a frost.':
    'Abre los recipientes cubiertos los días templados (máximas de unos 70–75 °F / 21–24 °C) y vuelve a cerrarlos antes de una helada.',
  'Sown now, the late-summer warmth gives the warm step and the winter the cold: seedlings the first spring.':
    'Sembrada ahora, el calor de finales del verano le da el paso cálido y el invierno el frío: plántulas la primera primavera.',
  'It makes a root after the first winter and its first leaf only after the second: expect nothing to show for over a year.':
    'Echa raíz después del primer invierno y su primera hoja solo después del segundo: no esperes ver nada durante más de un año.',
  'Sown this late, the warm step comes next summer and the cold the winter after: seedlings the second spring.':
    'Sembrada tan tarde, el paso cálido llega el próximo verano y el frío el invierno siguiente: plántulas la segunda primavera.',
  // The calendar's own treatment notes, when the record gives none.
  'Nick or sand the seed coat (scarification) so water can get in.':
    'Haz una muesca en la cubierta de la semilla o líjala (escarificación) para que le entre el agua.',
  'Dip the seed in hot water, about 85 °C (185 °F), for 2 minutes, then drain.':
    'Sumerge la semilla en agua caliente, a unos 85 °C (185 °F), durante 2 minutos, y luego escúrrela.',
  'Coat the seed with the matching rhizobial inoculant just before sowing.':
    'Cubre la semilla con el inoculante de rizobios que le corresponde justo antes de sembrar.',
  // Species that need warm soil (readiness.ts).
  'Expect it late: a warm-season grass: it sprouts only once the soil is about 10–13 °C (50–55 °F).':
    'Espérala tarde: es un pasto de estación cálida y solo brota cuando el suelo está a unos 10–13 °C (50–55 °F).',
  'Expect it late: a slow warm-season grass: it needs warm soil and about 12 weeks to fill a plug.':
    'Espérala tarde: es un pasto de estación cálida lento; necesita suelo templado y unas 12 semanas para llenar un alvéolo.',
  'Keep the pots damp and labelled the whole time.': 'Mantén las macetas húmedas y etiquetadas todo el tiempo.',
  'Hardened off, with roots holding the pot together: plant out, or hand over at the plant share.':
    'Ya aclimatada y con raíces que sostienen el cepellón: plántala o entrégala en el reparto de plantas.',
  'Hardened off and in its second spring, with roots holding the pot together: plant out, or hand over at the plant share.':
    'Ya aclimatada, en su segunda primavera y con raíces que sostienen el cepellón: plántala o entrégala en el reparto de plantas.',
  'Grown outdoors, so already hardened, with roots holding the pot together: plant out, or hand over at the plant share.':
    'Criada al aire libre, así que ya aclimatada, y con raíces que sostienen el cepellón: plántala o entrégala en el reparto de plantas.',
  'Grown outdoors, so already hardened and in its second spring, with roots holding the pot together: plant out, or hand over at the plant share.':
    'Criada al aire libre, así que ya aclimatada, en su segunda primavera y con raíces que sostienen el cepellón: plántala o entrégala en el reparto de plantas.',
};

/** Sentences with values in them: the English pattern and its Spanish. */
const RULES: SentenceRule[] = [
  [
    /^Keep the seed in damp sand or vermiculite in a sealed, labelled bag at room temperature for (\d+) days, then move it to the refrigerator\.$/,
    (days) =>
      `Guarda la semilla en arena o vermiculita húmeda, en una bolsa cerrada y etiquetada, a temperatura ambiente durante ${days} días; luego pásala al refrigerador.`,
  ],
  [
    /^Seal it in a labelled bag and keep it in the refrigerator at 1–5 °C \(33–41 °F\) for (\d+) days\.$/,
    (days) =>
      `Ciérrala en una bolsa etiquetada y guárdala en el refrigerador a 1–5 °C (33–41 °F) durante ${days} días.`,
  ],
  [
    /^The record gives no length; (\d+) days suits many prairie species\.$/,
    (days) => `La ficha no dice cuánto tiempo; ${days} días le van bien a muchas especies de pradera.`,
  ],
  [
    /^Sow (in cells or small pots|in mini soil blocks) under lights \(14–16 hours a day, lamps 2–4 in \/ 5–10 cm above the seedlings\)\.$/,
    (where) =>
      `Siembra ${where === 'in mini soil blocks' ? 'en minibloques de tierra' : 'en celdas o macetas pequeñas'} bajo lámparas (14–16 horas al día, lámparas a 2–4 in / 5–10 cm de las plántulas).`,
  ],
  [/^Plan on (\d+) days \(7–14 is usual\)\.$/, (days) => `Calcula unos ${days} días (lo normal es de 7 a 14).`],
  [
    /^Keep the pots outdoors, damp and in light shade through the summer: (\d+) warm, moist days come before the cold\.$/,
    (days) =>
      `Deja las macetas afuera, húmedas y a media sombra durante el verano: ${days} días cálidos y húmedos van antes del frío.`,
  ],
  [
    /^Leave the pots out in the cold and wet: (\d+) days of cold-moist stratification from now, given by the winter\.$/,
    (days) =>
      `Deja las macetas afuera, al frío y la humedad: ${days} días de estratificación fría y húmeda a partir de ahora, que da el invierno.`,
  ],
  [
    /^Then sow outdoors on (\d{4}-\d{2}-\d{2}): winter gives the rest of the cold\.$/,
    (date) => `Después siembra afuera el ${date}: el invierno da el resto del frío.`,
  ],
  [
    /^This seed needs (\d+) warm, moist days and then (\d+) cold, moist days\.$/,
    (warm, cold) => `Esta semilla necesita ${warm} días cálidos y húmedos y después ${cold} días fríos y húmedos.`,
  ],
];

/** One sentence in Spanish, or undefined when it has no twin. */
const sentenceIn = sentenceTable(FIXED, RULES);

/**
 * A calendar text with no species of its own (the frost date, the winter-sowing window, the share)
 * in the reader's language, sentence by sentence; a sentence without a twin stays as written.
 */
export function calendarTextIn(detail: string, locale: WordLocale): string {
  if (locale === 'en') return detail;
  return detail
    .split(/(?<=\.) /)
    .map((part) => (part.trim() === '' ? part : (sentenceIn(part.trim()) ?? part)))
    .join(' ');
}

/** One step's detail in the reader's language; the species' sowing depth in that language's own words. */
export function stepDetailIn(detail: string, species: Species, locale: WordLocale): string {
  if (locale === 'en') return detail;
  // The depth sentence may hold two sentences of its own: say it whole first, then the rest one by one.
  const depth = sowingDepthSentence(species.germination);
  const [before, ...after] = detail.split(depth);
  const each = (text: string) =>
    text
      .split(/(?<=\.) /)
      .map((part) => (part.trim() === '' ? part : (sentenceIn(part.trim()) ?? part)))
      .join(' ');
  if (after.length === 0) return each(detail);
  return [each(before), wordsFor(locale).sowingDepthSentence(species.germination), each(after.join(depth))]
    .map((p) => p.trim())
    .filter(Boolean)
    .join(' ');
}

/** Why a species needs a second season in the pot (readiness.ts), for the warning below. */
const SECOND_SEASON_WHY: Record<string, string> = {
  'shrub seedlings need a second season in the pot to be worth planting':
    'las plántulas de arbusto necesitan una segunda temporada en maceta para que valga la pena plantarlas',
  'tree seedlings need a second season in the pot to be worth planting':
    'las plántulas de árbol necesitan una segunda temporada en maceta para que valga la pena plantarlas',
  'the seed makes a root after its first winter and its first leaf only after a second; the seedling is tiny for a year more':
    'la semilla echa raíz después de su primer invierno y su primera hoja solo después del segundo; la plántula sigue siendo diminuta un año más',
  'compass plants spend the first year on a taproot and a small rosette; give them in their second spring':
    'las plantas brújula pasan el primer año haciendo una raíz pivotante y una rosetita; dalas en su segunda primavera',
  'pale purple coneflower takes about two years to a finished plug':
    'la pale purple coneflower tarda unos dos años en llenar un alvéolo',
};

/** A sowing method's English phrase → its Spanish phrase (the shared seed-word tables). */
const METHOD_PHRASE = new Map(
  (Object.keys(SOWING_METHOD_WORDS) as (keyof typeof SOWING_METHOD_WORDS)[]).map((m) => [
    SOWING_METHOD_WORDS[m].phrase as string,
    wordsFor('es').sowingMethod[m].phrase,
  ]),
);
const methodsIn = (list: string) => {
  const each = list.split(', ').map((m) => METHOD_PHRASE.get(m));
  return each.every((m): m is string => m !== undefined) ? each.join(', ') : undefined;
};

/** The calendar's warnings on a batch, each a whole message with the species' name first. */
const WARNING_RULES: [RegExp, (...groups: string[]) => string | undefined][] = [
  [
    /^(.+): the usual start \((\S+)\) is past\. Start today and sow on (\S+); plants are ready about (\S+)\.$/,
    (name, usual, sow, ready) =>
      `${name}: el inicio habitual (${usual}) ya pasó. Empieza hoy y siembra el ${sow}; las plantas estarán listas hacia el ${ready}.`,
  ],
  [
    /^(.+): (.+)\. Keep it potted on through summer and winter \(sink the pots in the ground or mulch them\); it is ready to give about (\S+)\.$/,
    (name, why, ready) =>
      SECOND_SEASON_WHY[why]
        ? `${name}: ${SECOND_SEASON_WHY[why]}. Mantenla en maceta durante el verano y el invierno (entierra las macetas o cúbrelas con mantillo); estará lista para dar hacia el ${ready}.`
        : undefined,
  ],
  [
    /^(.+): (\S+) is outside the winter-sowing window \((\S+) to (\S+)\)\.$/,
    (name, sow, from, to) =>
      `${name}: el ${sow} queda fuera de la temporada de siembra de invierno (del ${from} al ${to}).`,
  ],
  [
    /^(.+) needs (\d+) days of cold-moist stratification; sown outdoors on (\S+) it gets about (\d+)\. Give it (\d+) days in the refrigerator first, from (\S+) \(on the calendar\)\.$/,
    (name, days, sow, got, short, from) =>
      `${name} necesita ${days} días de estratificación fría y húmeda; sembrada afuera el ${sow}, recibe unos ${got}. Dale primero ${short} días en el refrigerador, a partir del ${from} (está en el calendario).`,
  ],
  [
    /^(.+) needs (\d+) days of cold-moist stratification; sown outdoors on (\S+) it gets about (\d+)\. A shorter cold period gives fewer seedlings, and some seed may wait a year; sowing under lights after (\d+) days in the refrigerator is surer\.$/,
    (name, days, sow, got, fridge) =>
      `${name} necesita ${days} días de estratificación fría y húmeda; sembrada afuera el ${sow}, recibe unos ${got}. Un frío más corto da menos plántulas, y alguna semilla puede esperar un año; es más seguro sembrar bajo lámparas después de ${fridge} días en el refrigerador.`,
  ],
  [
    /^(.+) needs (\d+) warm then (\d+) cold days( and sends up its first leaf only after a second winter)?; sown on (\S+), expect seedlings in spring (\d{4}), not (\d{4})\.$/,
    (name, warm, cold, second, sow, year, notYear) =>
      `${name} necesita ${warm} días cálidos y después ${cold} fríos${second ? ' y saca su primera hoja solo después de un segundo invierno' : ''}; sembrada el ${sow}, espera plántulas en la primavera de ${year}, no en la de ${notYear}.`,
  ],
  [
    /^(.+) will not be ready for the plant share on (\S+): plants by (.+) are ready about (\S+), (\d+) days later\.$/,
    (name, target, method, ready, days) =>
      METHOD_PHRASE.has(method)
        ? `${name} no estará lista para el reparto de plantas del ${target}: con ${METHOD_PHRASE.get(method)}, las plantas están listas hacia el ${ready}, ${days} días después.`
        : undefined,
  ],
  [
    /^(.+) is not usually raised by (.+); its record lists (.+)\.$/,
    (name, method, list) =>
      METHOD_PHRASE.has(method) && methodsIn(list)
        ? `${name} no se suele criar con ${METHOD_PHRASE.get(method)}; su ficha indica ${methodsIn(list)}.`
        : undefined,
  ],
  [
    /^(.+) is sown where it will grow, so there will be no pots of it for the plant share on (\S+)\.$/,
    (name, target) =>
      `${name} se siembra donde va a crecer, así que no habrá macetas de ella para el reparto de plantas del ${target}.`,
  ],
  [
    /^(.+): the usual sowing day \((\S+)\) is past, but (winter sowing|frost-seeding pots outdoors) still works until (\S+)\. Sow today; seedlings are expected about (\S+)\.$/,
    (name, usual, how, until, sprouts) =>
      `${name}: el día habitual de siembra (${usual}) ya pasó, pero ${how === 'winter sowing' ? 'la siembra de invierno' : 'sembrar en macetas afuera antes de las heladas'} todavía funciona hasta el ${until}. Siembra hoy; se esperan plántulas hacia el ${sprouts}.`,
  ],
];

/** One of the calendar's warnings on a batch in the reader's language; as written when it has no twin. */
export function warningIn(message: string, locale: WordLocale): string {
  if (locale === 'en') return message;
  for (const [pattern, say] of WARNING_RULES) {
    const m = pattern.exec(message);
    if (m) return say(...m.slice(1)) ?? message;
  }
  return message;
}
