import { createInstance, type TFunction } from 'i18next';
import type { WordLocale } from '@homeground/shared';
import { en } from './locales/en.js';
import { es } from './locales/es.js';
import { DEFAULT_API_LOCALE } from './negotiate-locale.js';

/** Catalogues by language; Spanish `satisfies` the English shape, so a missing key does not compile. */
const resources = { en: { api: en }, es: { api: es } } as const;

// One instance for the process, started synchronously from bundled catalogues (no files, no fetch).
const instance = createInstance();
void instance.init({
  resources,
  lng: DEFAULT_API_LOCALE,
  fallbackLng: DEFAULT_API_LOCALE,
  ns: ['api'],
  defaultNS: 'api',
  initAsync: false,
  // Answers are JSON, never HTML: nothing to escape, and "&" must stay "&".
  interpolation: { escapeValue: false },
  returnNull: false,
});

/** A dotted key of the English catalogue ("places.unknownZip"). */
type Leaves<T, P extends string = ''> = {
  [K in keyof T & string]: T[K] extends string
    ? // A plural pair ("free_one", "free_other") is asked for by its stem with a count.
      K extends `${infer Stem}_${'one' | 'other'}`
      ? `${P}${Stem}` | `${P}${K}`
      : `${P}${K}`
    : Leaves<T[K], `${P}${K}.`>;
}[keyof T & string];
export type ApiMessageKey = Leaves<typeof en>;

/** Says one of the API's sentences in a language: `say('es')('places.unknownZip', { zip })`. */
export function apiWords(locale: WordLocale): (key: ApiMessageKey, values?: Record<string, unknown>) => string {
  const t: TFunction = instance.getFixedT(locale, 'api');
  return (key, values) => t(key, values ?? {}) as string;
}
