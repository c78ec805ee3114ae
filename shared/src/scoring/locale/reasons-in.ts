import type { AlternativesResponse, MixResponse, RecommendationsResponse } from '../../types/mix-api.js';
import type { ScorePart } from '../../types/recommendation.js';
import { MONTH_WORDS } from '../../vocabulary/months.js';
import { HABITAT_WORDS, MOISTURE_WORDS, SOIL_TEXTURE_WORDS, SUN_WORDS } from '../../vocabulary/site-words.js';
import { SPANISH_WORDS as W } from '../../vocabulary/locale/spanish-words.js';
import { wordsFor } from '../../vocabulary/locale/words-for.js';
import type { WordLocale } from '../../vocabulary/locale/vocabulary.js';
import { type SentenceRule, sentenceTable } from '../../vocabulary/locale/sentence-table.js';

/**
 * "Why it fits" and a mix's roles in the reader's language.
 *
 * The engine builds its reasons in English inside its hot loops, cached by value (30,000 species a
 * ranking); a language there would multiply every cache. Only the few dozen parts an answer carries
 * are read, so they are said again here, once, in the chosen language: each English sentence the
 * engine makes has its Spanish twin below, with the words inside it (sun, soil, habitats, months)
 * taken from the shared Spanish word tables. A sentence the catalogue itself wrote (a species' bird
 * note, named specialist bees) has no twin and stays as written. English passes through unchanged.
 */

const es = wordsFor('es');

/** English word → Spanish word, for one table of the shared vocabulary. */
function inverse<K extends string>(english: Record<K, string>, spanish: Record<K, string>): Map<string, string> {
  return new Map((Object.keys(english) as K[]).map((k) => [english[k], spanish[k]]));
}

const SUN = inverse(SUN_WORDS, W.sun);
const MOISTURE = inverse(MOISTURE_WORDS, W.moisture);
const HABITAT = inverse(HABITAT_WORDS, W.habitat);
const SOIL = inverse(SOIL_TEXTURE_WORDS, W.soilTexture);
// The soil part names the code itself ("clay soil"), so the bare codes are words too.
for (const code of Object.keys(W.soilTexture) as (keyof typeof W.soilTexture)[]) SOIL.set(code, W.soilTexture[code]);
const MONTH = new Map(
  Object.entries(MONTH_WORDS).flatMap(([n, w]) => {
    const s = W.month[Number(n) as keyof typeof W.month];
    return [
      [w.short, s.short],
      [w.long, s.long],
    ] as [string, string][];
  }),
);

/** "full sun or part shade" → ["full sun", "part shade"], in the English join's order. */
function listOf(phrase: string): string[] {
  return phrase
    .split(/, | and | or /)
    .map((w) => w.trim())
    .filter(Boolean);
}

/** A list said again in Spanish, each word from `table`; undefined if one has no Spanish word. */
function listIn(phrase: string, table: Map<string, string>, conjunction: 'and' | 'or'): string | undefined {
  const words = listOf(phrase).map((w) => table.get(w));
  return words.every((w): w is string => w !== undefined) ? es.join(words, conjunction) : undefined;
}

/** "Jun–Aug and Oct" → "jun–ago y oct". */
function monthsIn(phrase: string): string {
  return phrase.replace(/[A-Z][a-z]+/g, (m) => MONTH.get(m) ?? m).replace(/ and /g, ' y ');
}

const PERIOD: Record<string, string> = {
  spring: 'primavera',
  'early summer': 'principios del verano',
  'late summer and fall': 'finales del verano y el otoño',
};

const RULE_PERIOD: Record<string, string> = {
  Spring: 'Primavera (de abril a mediados de junio)',
  'Early summer': 'Principios del verano (de mediados de junio a julio)',
  'Late summer and fall': 'Finales del verano y otoño (de agosto a octubre)',
};

const BLOOMERS: Record<string, [string, string]> = {
  'early bloomer': ['las que florecen temprano', 'la única que florece temprano'],
  'midsummer bloomer': ['las que florecen a mitad del verano', 'la única que florece a mitad del verano'],
  'late bloomer': ['las que florecen tarde', 'la única que florece tarde'],
};

/** Sentences that never change, word for word. */
const FIXED: Record<string, string> = {
  'Deer usually leave it alone.': 'Los venados casi nunca la tocan.',
  'Deer browse it now and then.': 'Los venados la mordisquean de vez en cuando.',
  'Deer browse it readily; with many deer around, expect damage unless you fence it.':
    'A los venados les gusta; si hay muchos, espera daños a menos que la cerques.',
  'Stays in a clump where you plant it.': 'Se queda en su mata donde la plantas.',
  'Spreads by roots or seed; give it room.': 'Se extiende por raíces o semillas; dale espacio.',
  'Spreads hard by roots or seed and can take over a small bed.':
    'Se extiende con fuerza por raíces o semillas y puede adueñarse de un arriate pequeño.',
  'A rain-garden plant: takes standing water after storms and dry spells between them.':
    'Una planta de jardín de lluvia: aguanta el agua encharcada después de las tormentas y las sequías entre ellas.',
  'Takes both wet and drier soil, so it suits the sides of a rain garden.':
    'Aguanta suelo húmedo y más seco, así que le va a las orillas de un jardín de lluvia.',
  'Grows in full shade, for your shade garden.': 'Crece a plena sombra, para tu jardín de sombra.',
  'Easy to raise from seed.': 'Fácil de criar desde semilla.',
  'Easy to find: native-plant nurseries commonly sell it.':
    'Fácil de encontrar: los viveros de plantas nativas suelen venderla.',
  'Seed and plants are commonly sold (USDA commercial availability).':
    'Semillas y plantas se venden comúnmente (disponibilidad comercial según el USDA).',
  'Seed is grown mostly on contract, so plants can be hard to find.':
    'La semilla se produce sobre todo por contrato, así que las plantas pueden ser difíciles de encontrar.',
  'Seed is only collected from the wild, so plants can be hard to buy.':
    'La semilla solo se recolecta en el campo, así que las plantas pueden ser difíciles de comprar.',
  'USDA knows no commercial source: it may be hard to buy as seed or plants.':
    'El USDA no conoce ninguna fuente comercial: puede ser difícil comprarla en semilla o en planta.',
  'No commercial source is on record for it: plants may be hard to find, so ask native-plant nurseries near you.':
    'No hay ninguna fuente comercial registrada: puede costar encontrar plantas, así que pregunta en los viveros de plantas nativas cercanos.',
  'A plant for paths and lawns, where it takes being walked on: in a flower bed keep it to the path or edge.':
    'Una planta para caminos y céspedes, donde aguanta que la pisen: en un arriate de flores déjala en el camino o la orilla.',
  'Feeds monarch caterpillars, which eat only milkweeds and a few close relatives.':
    'Alimenta a las orugas de la mariposa monarca, que solo comen algodoncillos y algunas parientes cercanas.',
  'Hosts the caterpillars of a few moths and butterflies.': 'Hospeda las orugas de algunas polillas y mariposas.',
  'Among the best caterpillar host plants of the wildflowers, grasses and ferns.':
    'Entre las mejores plantas hospederas de orugas de las flores silvestres, pastos y helechos.',
  'Among the best caterpillar host plants of the shrubs and trees.':
    'Entre las mejores plantas hospederas de orugas de los arbustos y árboles.',
  'A good caterpillar host plant among wildflowers, grasses and ferns.':
    'Una buena planta hospedera de orugas entre las flores silvestres, pastos y helechos.',
  'A good caterpillar host plant among shrubs and trees.':
    'Una buena planta hospedera de orugas entre los arbustos y árboles.',
  'Pollen and nectar for bees, including bees that collect pollen from this genus only.':
    'Polen y néctar para las abejas, incluidas abejas que solo recogen polen de este género.',
  'Flowers for bees and other pollinators.': 'Flores para las abejas y otros polinizadores.',
  'Flowers for bees.': 'Flores para las abejas.',
  'Its many caterpillars are food for nesting birds, which raise their young on them.':
    'Sus muchas orugas alimentan a las aves que anidan, que crían a sus polluelos con ellas.',
  'A fern to fill the shade between the flowers.': 'Un helecho para llenar la sombra entre las flores.',
  'Characteristic of your region: native to only a few ecoregions, yours among them.':
    'Propia de tu región: nativa de pocas ecorregiones, entre ellas la tuya.',
  'A plant of dry prairies, glades and sands, at home on dry ground like yours.':
    'Una planta de praderas secas, claros rocosos y arenas, a gusto en terreno seco como el tuyo.',
  'A plant of marshes, wet prairies and streambanks, at home in wet ground like yours.':
    'Una planta de pantanos, praderas húmedas y orillas de arroyo, a gusto en terreno húmedo como el tuyo.',
  'A woodland plant, at home in shade like yours.': 'Una planta de bosque, a gusto en la sombra como la tuya.',
  'A plant of ground like yours.': 'Una planta de terrenos como el tuyo.',
  // How the mix is balanced: the rules' headlines.
  'At least one native milkweed when monarchs are a goal: their caterpillars eat nothing else':
    'Al menos un algodoncillo nativo cuando las monarcas son un objetivo: sus orugas no comen otra cosa',
  'Plants for the front, middle and back of the bed, as far as the species that suit it allow':
    'Plantas para el frente, el medio y el fondo del arriate, hasta donde lo permitan las especies que le van',
  // Roles in the mix.
  'a native milkweed, for monarchs': 'un algodoncillo nativo, para las monarcas',
  'a grass or sedge to fill between the flowers': 'un pasto o junco para llenar entre las flores',
  'front of the bed': 'al frente del arriate',
  'middle of the bed': 'en medio del arriate',
  'back of the bed': 'al fondo del arriate',
};

const WETLAND: Record<string, string> = {
  'almost always found in wetlands': 'casi siempre está en humedales',
  'usually found in wetlands': 'suele estar en humedales',
  'found in wetlands and uplands alike': 'está tanto en humedales como en tierras altas',
  'usually found in uplands': 'suele estar en tierras altas',
  'almost never found in wetlands': 'casi nunca está en humedales',
};

/** Sentences with values in them: the English pattern and its Spanish, in Spanish word order. */
const RULES: SentenceRule[] = [
  [/^Native to (.+)\.$/, (state) => `Nativa de ${state}.`],
  [/^Not native to (.+)\.$/, (state) => `No es nativa de ${state}.`],
  [
    /^Native next door in (.+), but not recorded as native in (.+)\.$/,
    (next, state) => `Nativa al lado, en ${next}, pero no registrada como nativa de ${state}.`,
  ],
  [
    /^Needs (.+) soil; your soil is (.+)\.$/,
    (wanted, yours) => {
      const w = listIn(wanted, MOISTURE, 'or');
      const y = MOISTURE.get(yours);
      return w && y ? `Necesita suelo ${w}; tu suelo es ${y}.` : undefined;
    },
  ],
  [
    /^Needs (.+); your ground has (.+)\.$/,
    (wanted, ground) => {
      const w = listIn(wanted, SUN, 'or');
      const g = SUN.get(ground);
      return w && g ? `Necesita ${w}; tu terreno tiene ${g}.` : undefined;
    },
  ],
  [
    /^Too tall: grows (.+); your limit is (.+)\.$/,
    (range, limit) => `Demasiado alta: mide ${range}; tu límite es ${limit}.`,
  ],
  [
    /^Too big: it grows about (.+) across, more than your (.+) bed can hold\.$/,
    (width, area) => `Demasiado grande: mide unos ${width} de ancho, más de lo que caben en tus ${area}.`,
  ],
  [
    /^Grows in (.+); your ground has (.+)\.$/,
    (wanted, ground) => {
      const w = listIn(wanted, SUN, 'or');
      const g = SUN.get(ground);
      return w && g ? `Crece a ${w}; tu terreno tiene ${g}.` : undefined;
    },
  ],
  [
    /^Takes (.+) soil; your soil is (.+)\.$/,
    (wanted, yours) => {
      const w = listIn(wanted, MOISTURE, 'or');
      const y = MOISTURE.get(yours);
      return w && y ? `Aguanta suelo ${w}; tu suelo es ${y}.` : undefined;
    },
  ],
  [
    /^Grows in (\S+) soil like yours\.$/,
    (soil) => (SOIL.get(soil) ? `Crece en ${SOIL.get(soil)}, como tu suelo.` : undefined),
  ],
  [
    /^Prefers (.+) soil; yours is (\S+)\.$/,
    (prefers, yours) => {
      const p = listIn(prefers, SOIL, 'or');
      const y = SOIL.get(yours);
      return p && y ? `Prefiere ${p}; tu suelo es ${y}.` : undefined;
    },
  ],
  [
    /^Stays low enough: grows (.+); your limit is (.+)\.$/,
    (range, limit) => `No pasa de la altura que quieres: mide ${range}; tu límite es ${limit}.`,
  ],
  [
    /^Can grow taller than you want: grows (.+); your limit is (.+)\.$/,
    (range, limit) => `Puede crecer más de lo que quieres: mide ${range}; tu límite es ${limit}.`,
  ],
  [
    /^Big for the space: it grows about (.+) across and will shade part of your (.+) bed\.$/,
    (width, area) => `Grande para el espacio: mide unos ${width} de ancho y dará sombra a parte de tus ${area}.`,
  ],
  [
    /^Belongs to the (.+) plant communities of your ecoregion\.$/,
    (list) => {
      const l = listIn(list, HABITAT, 'and');
      return l ? `Pertenece a las comunidades de plantas de ${l} de tu ecorregión.` : undefined;
    },
  ],
  [
    /^Grows wild in (.+), which are not typical of your ecoregion\.$/,
    (list) => {
      const l = listIn(list, HABITAT, 'or');
      return l ? `Crece silvestre en ${l}, que no son típicos de tu ecorregión.` : undefined;
    },
  ],
  [
    /^Blooms (.+), when your mix has least\.$/,
    (months) => `Florece ${monthsIn(months)}, cuando tu mezcla tiene menos.`,
  ],
  [
    /^Blooms (.+), adding to the (\d+) species your mix has in flower in (.+)\.$/,
    (months, n, period) =>
      PERIOD[period]
        ? `Florece ${monthsIn(months)} y se suma a ${n === '1' ? 'la especie' : `las ${n} especies`} que tu mezcla tiene en flor en ${PERIOD[period]}.`
        : undefined,
  ],
  [
    /^Hosts the caterpillars of (\d+) moth (?:or|and) butterfly species in its genus\.$/,
    (n) => `Hospeda las orugas de ${n} ${n === '1' ? 'especie' : 'especies'} de polillas y mariposas en su género.`,
  ],
  [
    /^In the wild it is (.+) \(National Wetland Plant List\)\.$/,
    (words) => (WETLAND[words] ? `En la naturaleza ${WETLAND[words]} (National Wetland Plant List).` : undefined),
  ],
  [
    /^Thrives in (\S+) soil and (.+), as on your ground\.$/,
    (moisture, sun) =>
      MOISTURE.get(moisture) && SUN.get(sun)
        ? `Prospera en suelo ${MOISTURE.get(moisture)} y a ${SUN.get(sun)}, como en tu terreno.`
        : undefined,
  ],
  [
    /^Does best in (\S+) soil, as on your ground\.$/,
    (moisture) =>
      MOISTURE.get(moisture) ? `Le va mejor en suelo ${MOISTURE.get(moisture)}, como en tu terreno.` : undefined,
  ],
  [
    /^Does best in (.+), as on your ground\.$/,
    (sun) => (SUN.get(sun) ? `Le va mejor a ${SUN.get(sun)}, como en tu terreno.` : undefined),
  ],
  [/^Grows up to (.+): tall for a small bed\.$/, (h) => `Llega a medir ${h}: alta para un arriate pequeño.`],
  [
    /^Pollen and nectar for bees, and the host of specialist bees \((.+)\)\.$/,
    (names) => `Polen y néctar para las abejas, y hospedera de abejas especialistas (${names}).`,
  ],
  // How the mix is balanced: the rules' headlines and the mix's size.
  [
    /^(Spring|Early summer|Late summer and fall) \((April to mid-June|mid-June to July|August to October)\): at least (\d+) species in flower every month, so something is in flower from spring to frost$/,
    (part, _words, n) =>
      RULE_PERIOD[part]
        ? `${RULE_PERIOD[part]}: al menos ${n} especies en flor cada mes, para que siempre haya algo en flor de la primavera a las heladas`
        : undefined,
  ],
  [
    /^At least (\d+) kinds of flowers \(wildflowers, legumes, shrubs\) in a full mix$/,
    (n) => `Al menos ${n} clases de flores (flores silvestres, leguminosas, arbustos) en una mezcla completa`,
  ],
  [
    /^Grasses and sedges: (\d+)–(\d+) of the (\d+) species$/,
    (min, max, size) => `Pastos y juncos: de ${min} a ${max} de las ${size} especies`,
  ],
  [
    /^(.+) has room for about (\d+) species, each in a group of several plants\.$/,
    (area, n) => `En ${area} caben unas ${n} especies, cada una en un grupo de varias plantas.`,
  ],
  // The catalogue's coverage: a place it does not cover yet.
  [
    /^Homeground's catalogue holds native plants of the eastern and central United States and does not cover (your state|your ecoregion \(EPA Level III (.+)\)) yet, so it does not recommend plants there: eastern plants would be the wrong choice\. A native-plant society or extension office near you can help\.$/,
    (where, code) =>
      `El catálogo de Homeground reúne plantas nativas del este y el centro de Estados Unidos y todavía no cubre ${where === 'your state' ? 'tu estado' : `tu ecorregión (nivel III de la EPA ${code})`}, así que no recomienda plantas allí: las plantas del este no serían una buena elección. Una sociedad de plantas nativas o la oficina de extensión más cercana pueden ayudarte.`,
  ],
  // Roles in the mix.
  [/^the only one of the (.+)s$/, (noun) => (BLOOMERS[noun] ? BLOOMERS[noun][1] : undefined)],
  [
    /^one of (\d+) (.+)s$/,
    (n, noun) => (BLOOMERS[noun] ? `una de ${n} ${BLOOMERS[noun][0].replace(/^las /, '')}` : undefined),
  ],
];

/** One sentence in Spanish, or undefined when it has no twin. */
const sentenceIn = sentenceTable(FIXED, RULES);

/**
 * One engine reason in the reader's language. A reason of several sentences (a near miss's
 * "Not native … Needs …", a catalogue note before an engine sentence) is said sentence by sentence;
 * a sentence the engine did not write comes back as it was.
 */
export function reasonIn(reason: string, locale: WordLocale): string {
  if (locale === 'en') return reason;
  const whole = sentenceIn(reason);
  if (whole !== undefined) return whole;
  return reason
    .split(/(?<=\.) /)
    .map((part) => sentenceIn(part) ?? part)
    .join(' ');
}

/** The parts of "why it fits" with their reasons in the reader's language (points unchanged). */
export function partsIn<P extends Pick<ScorePart, 'reason'>>(parts: readonly P[], locale: WordLocale): P[] {
  return locale === 'en' ? [...parts] : parts.map((p) => ({ ...p, reason: reasonIn(p.reason, locale) }));
}

/** The coverage answer with its message in the reader's language. */
function coverageIn<C extends { message?: string }>(coverage: C, locale: WordLocale): C {
  return coverage.message === undefined ? coverage : { ...coverage, message: reasonIn(coverage.message, locale) };
}

/** A ranking's reasons, near misses' reasons included, in the reader's language. */
export function recommendationsIn(answer: RecommendationsResponse, locale: WordLocale): RecommendationsResponse {
  if (locale === 'en') return answer;
  const each = (list: RecommendationsResponse['ranked']) =>
    list.map((s) => ({
      ...s,
      parts: partsIn(s.parts, locale),
      ...(s.ineligibleReason !== undefined ? { ineligibleReason: reasonIn(s.ineligibleReason, locale) } : {}),
    }));
  return {
    ...answer,
    ranked: each(answer.ranked),
    alsoConsider: each(answer.alsoConsider),
    coverage: coverageIn(answer.coverage, locale),
  };
}

/** A balanced mix with each species' reasons and roles in the reader's language. */
export function mixIn(mix: MixResponse, locale: WordLocale): MixResponse {
  if (locale === 'en') return mix;
  const chosen = mix.palette.chosen.map((c) => ({
    ...c,
    parts: partsIn(c.parts, locale),
    roles: c.roles.map((r) => reasonIn(r, locale)),
  }));
  // The rules' headlines and the size sentence; their details and the notices are written in the
  // reader's language by the engine itself (palette-balancing/mix-words.ts, given the locale).
  const constraints = mix.palette.constraints.map((c) => ({ ...c, rule: reasonIn(c.rule, locale) }));
  const sizeReason = reasonIn(mix.palette.sizeReason, locale);
  // The engine writes the notices in the reader's language already, except the coverage sentence.
  const notices = mix.palette.notices.map((n) => reasonIn(n, locale));
  const coverage = coverageIn(mix.palette.coverage, locale);
  return { ...mix, palette: { ...mix.palette, chosen, constraints, sizeReason, notices, coverage } };
}

/** The alternatives for one place in a mix, with their reasons in the reader's language. */
export function alternativesIn(answer: AlternativesResponse, locale: WordLocale): AlternativesResponse {
  if (locale === 'en') return answer;
  return { ...answer, alternatives: answer.alternatives.map((a) => ({ ...a, parts: partsIn(a.parts, locale) })) };
}
