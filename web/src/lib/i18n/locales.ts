import { WORD_LOCALES, type WordLocale } from '@homeground/shared';

/** The languages the web speaks: the shared vocabulary's, so every word table has each of them. */
export const LOCALES = WORD_LOCALES;
export type Locale = WordLocale;

/** English is the catalogue's own language and the fallback for anything not yet translated. */
export const DEFAULT_LOCALE: Locale = 'en';

/** Where the language switch remembers the choice across visits. */
export const LOCALE_STORAGE_KEY = 'homeground.locale';

/** The name of each language in itself, as the switch shows it (so a reader finds their own). */
export const LOCALE_NAMES: Record<Locale, string> = { en: 'English', es: 'Español' };

/** BCP 47 tags for `Intl` and `<html lang>`: US English and Spanish as spoken in the US. */
export const LOCALE_TAGS: Record<Locale, string> = { en: 'en-US', es: 'es-US' };

export function isLocale(value: unknown): value is Locale {
  return typeof value === 'string' && (LOCALES as readonly string[]).includes(value);
}

/** The first browser language Homeground speaks ("es-MX" → "es"), else English. */
export function localeFromBrowser(languages: readonly string[]): Locale {
  for (const tag of languages) {
    const base = tag.toLowerCase().split('-')[0];
    if (isLocale(base)) return base;
  }
  return DEFAULT_LOCALE;
}

function readStored(): string | null {
  try {
    return window.localStorage.getItem(LOCALE_STORAGE_KEY);
  } catch {
    // Storage can be switched off (private windows, strict settings): fall back to the browser's.
    return null;
  }
}

/** The remembered choice, else the browser's languages. */
export function initialLocale(): Locale {
  const stored = readStored();
  if (isLocale(stored)) return stored;
  // Some browsers (and stubs) give only `language`, or neither.
  const languages = [...(navigator.languages ?? []), navigator.language].filter(
    (tag): tag is string => typeof tag === 'string',
  );
  return localeFromBrowser(languages);
}

/** Keeps the choice for the next visit; a browser that refuses storage just forgets it. */
export function rememberLocale(locale: Locale): void {
  try {
    window.localStorage.setItem(LOCALE_STORAGE_KEY, locale);
  } catch {
    // Nothing to do: the page still switches, only the next visit will not remember.
  }
}
