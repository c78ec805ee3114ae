import type { z } from 'zod';
import type { WordLocale } from './vocabulary.js';

/** One zod issue as a per-parse error map sees it (zod 4: `safeParse(value, { error })`). */
type Issue = z.core.$ZodRawIssue;

/** A per-parse error map: a message for an issue, or undefined to leave zod's own. */
export type IssueWords = (issue: Issue) => string | undefined;

const count = (n: unknown): string =>
  typeof n === 'number' || typeof n === 'bigint' ? new Intl.NumberFormat('es').format(n) : String(n);

/** "1 carácter", "12 caracteres": a count with its noun, singular for one. */
const counted = (n: unknown, one: string, other: string): string => `${count(n)} ${Number(n) === 1 ? one : other}`;

/** What a value should have been, by zod's name for the type. */
const ES_EXPECTED: Record<string, string> = {
  string: 'debe ser texto',
  number: 'debe ser un número',
  int: 'debe ser un número entero',
  bigint: 'debe ser un número entero',
  boolean: 'debe ser verdadero o falso',
  array: 'debe ser una lista',
  object: 'debe ser un objeto con sus campos',
  date: 'debe ser una fecha',
  null: 'debe estar vacío (null)',
};

/** Formats zod checks strings against, said as what the value must be. */
const ES_FORMAT: Record<string, string> = {
  email: 'debe ser una dirección de correo electrónico',
  url: 'debe ser una dirección web',
  uuid: 'debe ser un identificador válido (UUID)',
  guid: 'debe ser un identificador válido (UUID)',
  date: 'debe ser una fecha AAAA-MM-DD',
  datetime: 'debe ser una fecha y hora ISO 8601',
  time: 'debe ser una hora HH:MM',
  duration: 'debe ser una duración ISO 8601',
};

const isSized = (origin: unknown): origin is 'array' | 'set' | 'map' =>
  origin === 'array' || origin === 'set' || origin === 'map';

/** zod's own reasons in Spanish, worded like the schemas' ("debe …") so a field name can lead. */
const spanish: IssueWords = (issue) => {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.input === undefined) return 'es obligatorio';
      if (typeof issue.input === 'number' && Number.isNaN(issue.input)) return 'debe ser un número';
      return ES_EXPECTED[issue.expected] ?? 'no es del tipo esperado';
    case 'too_small': {
      const n = issue.minimum;
      if (issue.origin === 'string')
        return Number(n) === 1
          ? 'no puede quedar vacío'
          : `debe tener al menos ${counted(n, 'carácter', 'caracteres')}`;
      if (isSized(issue.origin)) return `debe tener al menos ${counted(n, 'elemento', 'elementos')}`;
      if (issue.origin === 'date') return `debe ser el ${String(n)} o después`;
      return issue.inclusive === false ? `debe ser mayor que ${count(n)}` : `debe ser ${count(n)} o más`;
    }
    case 'too_big': {
      const n = issue.maximum;
      if (issue.origin === 'string') return `debe tener como máximo ${counted(n, 'carácter', 'caracteres')}`;
      if (isSized(issue.origin)) return `debe tener como máximo ${counted(n, 'elemento', 'elementos')}`;
      if (issue.origin === 'file') return `debe pesar como máximo ${counted(n, 'byte', 'bytes')}`;
      if (issue.origin === 'date') return `debe ser el ${String(n)} o antes`;
      return issue.inclusive === false ? `debe ser menor que ${count(n)}` : `debe ser ${count(n)} o menos`;
    }
    case 'invalid_format':
      return ES_FORMAT[issue.format] ?? 'no tiene la forma esperada';
    case 'invalid_value':
      return issue.values.length === 1
        ? `debe ser ${JSON.stringify(issue.values[0])}`
        : `debe ser uno de estos: ${issue.values.map((v) => String(v)).join(', ')}`;
    case 'not_multiple_of':
      return `debe ser múltiplo de ${count(issue.divisor)}`;
    case 'unrecognized_keys':
      return 'no es un campo que esta petición acepte';
    case 'invalid_union':
    case 'invalid_key':
    case 'invalid_element':
    case 'custom':
      return 'no es válido';
    default:
      return undefined;
  }
};

/**
 * The shared schemas' own sentences, each as a pattern and its Spanish (`$1`: the number or list),
 * the common ones first.
 */
const ES_SCHEMA_SENTENCES: readonly [RegExp, string][] = [
  [/^must be at least 1 characters?$/, 'debe tener al menos 1 carácter'],
  [/^must be at least (\d+) characters$/, 'debe tener al menos $1 caracteres'],
  [/^must be at most (\d+) characters$/, 'debe tener como máximo $1 caracteres'],
  [/^must not be empty$/, 'no puede quedar vacío'],
  [/^must be a whole number$/, 'debe ser un número entero'],
  [/^must be at least (-?[\d.]+)$/, 'debe ser al menos $1'],
  [/^must be at most (-?[\d.]+)$/, 'debe ser como máximo $1'],
  [/^must be (-?[\d.]+) or more$/, 'debe ser $1 o más'],
  [/^must be more than (-?[\d.]+)$/, 'debe ser mayor que $1'],
  [/^must be (−?[\d.]+) to (−?[\d.]+)$/, 'debe estar entre $1 y $2'],
  [/^must not be negative$/, 'no puede ser negativo'],
  [/^must be a UUID$/, 'debe ser un identificador válido (UUID)'],
  [/^must be an e-mail address$/, 'debe ser una dirección de correo electrónico'],
  [/^must be true or false$/, 'debe ser verdadero o falso'],
  [/^must be one of (.+)$/, 'debe ser uno de estos: $1'],
  [/^must be a 5-digit US ZIP code$/, 'debe ser un código postal (ZIP) de EE. UU. de 5 cifras'],
  // The schemas' less common sentences, one each; zod-issue-words.test.ts reads the schema files and
  // fails when a sentence found there has no line here.
  [/^"(.+)" is listed twice$/, '"$1" aparece dos veces'],
  [/^this batch is listed twice$/, 'este lote aparece dos veces'],
  [/^each goal once$/, 'cada objetivo solo una vez'],
  [/^a calendar date, YYYY-MM-DD$/, 'una fecha del calendario, AAAA-MM-DD'],
  [/^a year from (\d+) to (\d+)$/, 'un año de $1 a $2'],
  [
    /^a moist stratification step needs its length in days \(e\.g\. (.+)\)$/,
    'un paso de estratificación húmeda necesita su duración en días (p. ej., $1)',
  ],
  [
    /^a saved mix brings its own site and place: give it alone$/,
    'una mezcla guardada trae su propio sitio y lugar: envíala sola',
  ],
  [/^choose where this fact comes from, or "from memory"$/, 'elige de dónde viene este dato, o "de memoria"'],
  [/^fill in at least one method$/, 'rellena al menos un método'],
  [/^give a new slot or new plants$/, 'indica un horario nuevo o plantas nuevas'],
  [/^give a zip, or both lat and lon$/, 'indica un código postal (ZIP), o lat y lon juntas'],
  [/^give both sun and moisture, or neither$/, 'indica el sol y la humedad juntos, o ninguno de los dos'],
  [
    /^give the area in ft² \(areaSqFt\) or in m² \(areaSqM\), not both$/,
    'indica el área en ft² (areaSqFt) o en m² (areaSqM), no las dos',
  ],
  [/^give your sun and moisture with your ZIP$/, 'indica tu sol y tu humedad junto con tu código postal (ZIP)'],
  [/^is not a confirmation link we sent$/, 'no es un enlace de confirmación que hayamos enviado'],
  [/^is not a reservation link we sent$/, 'no es un enlace de reserva que hayamos enviado'],
  [/^is not a waitlist link we sent$/, 'no es un enlace de lista de espera que hayamos enviado'],
  [/^is not an invitation link we sent$/, 'no es un enlace de invitación que hayamos enviado'],
  [/^is not valid JSON$/, 'no es JSON válido'],
  [/^is required: who took the photo$/, 'es obligatorio: quién tomó la foto'],
  [
    /^letters, digits, dot, dash or underscore, (\d+)–(\d+) characters$/,
    'letras, cifras, punto, guion o guion bajo, de $1 a $2 caracteres',
  ],
  [/^lower-case words joined by hyphens$/, 'palabras en minúsculas unidas por guiones'],
  [/^min must not exceed max$/, 'min no puede ser mayor que max'],
  [/^must not be more than (\w+)$/, 'no puede ser mayor que $1'],
  [/^must be (\d+) or later$/, 'debe ser $1 o posterior'],
  [/^must be (\d+) or earlier$/, 'debe ser $1 o anterior'],
  [/^must be (\d+)–(\d+)$/, 'debe estar entre $1 y $2'],
  [/^must be a 5-digit ZIP code$/, 'debe ser un código postal (ZIP) de 5 cifras'],
  [
    /^must be a USPS code of the 48 states or DC$/,
    'debe ser el código USPS de uno de los 48 estados contiguos o de DC',
  ],
  [
    /^must be a date and time with its offset, e\.g\. (.+)$/,
    'debe ser una fecha y hora con su diferencia horaria, p. ej., $1',
  ],
  [/^must be a first name only$/, 'debe ser solo el nombre de pila'],
  [/^must be a path on this site, starting with \/$/, 'debe ser una ruta de este sitio que empiece por /'],
  [/^must be a pickup slot id$/, 'debe ser el id de un horario de recogida'],
  [/^must be a whole month number$/, 'debe ser el número entero de un mes'],
  [
    /^must be a whole number from 1, or empty if you do not use this method$/,
    'debe ser un número entero desde 1, o quedar vacío si no usas este método',
  ],
  [/^must be a whole year$/, 'debe ser un año entero'],
  [/^must be after the last frost$/, 'debe ser después de la última helada'],
  [/^must be after the start$/, 'debe ser después del comienzo'],
  [
    /^must be an EPA Level III code, (\d+)–(\d+)$/,
    'debe ser un código de ecorregión de nivel III de la EPA, del $1 al $2',
  ],
  [/^must be at least ([\d.]+) in$/, 'debe ser al menos $1 pulgadas'],
  [/^must be at least the limit per species$/, 'debe ser al menos el límite por especie'],
  [/^must be at most ([\d.]+) acres$/, 'debe ser como máximo $1 acres'],
  [
    /^must be the http:\/\/ or https:\/\/ address the photo came from$/,
    'debe ser la dirección http:// o https:// de donde viene la foto',
  ],
  [/^must be the id of a saved mix link$/, 'debe ser el id del enlace de una mezcla guardada'],
  [/^must fall in the season's year$/, 'debe caer en el año de la temporada'],
  [/^must have at least one pickup slot$/, 'debe tener al menos un horario de recogida'],
  [/^must have at most (\d+) slots$/, 'debe tener como máximo $1 horarios'],
  [/^must list at most (\d+) batches$/, 'debe tener como máximo $1 lotes'],
  [/^must list at most (\d+) species$/, 'debe tener como máximo $1 especies'],
  [/^must name at least one method$/, 'debe indicar al menos un método'],
  [/^must name at least one species$/, 'debe indicar al menos una especie'],
  [/^only a loss has a reason$/, 'solo una pérdida lleva motivo'],
  [/^say why the plants were lost$/, 'di por qué se perdieron las plantas'],
  // Reasons of the shared checks the API runs after parsing (season dates, batch log, frost night).
  [/^must not be in the past \(today is (.+)\)$/, 'no puede estar en el pasado (hoy es $1)'],
  [/^must not be after today \((.+)\)$/, 'no puede ser posterior a hoy ($1)'],
  [/^must be from (\S+) to (\S+)$/, 'debe estar entre el $1 y el $2'],
  [
    /^would make more seedlings \((\d+)\) than seeds sown \((\d+)\)$/,
    'daría más plántulas ($1) que semillas sembradas ($2)',
  ],
  [/^is more than the (\d+) seedlings alive in this batch$/, 'es más que las $1 plántulas vivas de este lote'],
  [
    /^would make more potted up \((\d+)\) than seedlings alive \((\d+)\)$/,
    'daría más plantas pasadas a maceta ($1) que plántulas vivas ($2)',
  ],
];

/**
 * A schema's own English sentence in a language, for the common ones ("must be at least 10
 * characters"); any other sentence comes back as it is.
 */
export function schemaSentenceIn(locale: WordLocale, message: string): string {
  if (locale !== 'es') return message;
  for (const [pattern, spanishWords] of ES_SCHEMA_SENTENCES) {
    if (pattern.test(message)) return message.replace(pattern, spanishWords);
  }
  return message;
}

/**
 * zod's own issue messages (too short, missing, wrong type, not one of the choices) in a language,
 * as a per-parse error map. The schemas' own messages win over it, so their wording stays. English
 * keeps zod's words (undefined: nothing to change).
 */
export function zodIssueWordsFor(locale: WordLocale): IssueWords | undefined {
  return locale === 'es' ? spanish : undefined;
}
