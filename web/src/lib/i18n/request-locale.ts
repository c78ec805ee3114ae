import { DEFAULT_LOCALE, type Locale } from './locales.js';

// The page's language for requests made outside React (the http client): kept by the i18n instance.
let current: Locale = DEFAULT_LOCALE;

/** Called by the i18n instance when it starts and whenever the language changes. */
export function setRequestLocale(locale: Locale): void {
  current = locale;
}

/** The language the API should answer in (sent as `Accept-Language`). */
export function readRequestLocale(): Locale {
  return current;
}
