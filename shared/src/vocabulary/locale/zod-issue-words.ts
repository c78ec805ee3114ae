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
        return Number(n) === 1 ? 'no puede estar vacío' : `debe tener al menos ${counted(n, 'carácter', 'caracteres')}`;
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

/** The shared schemas' most common own sentences, each as a pattern and its Spanish (`$1`: the number or list). */
const ES_SCHEMA_SENTENCES: readonly [RegExp, string][] = [
  [/^must be at least 1 characters?$/, 'debe tener al menos 1 carácter'],
  [/^must be at least (\d+) characters$/, 'debe tener al menos $1 caracteres'],
  [/^must be at most (\d+) characters$/, 'debe tener como máximo $1 caracteres'],
  [/^must not be empty$/, 'no puede estar vacío'],
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
