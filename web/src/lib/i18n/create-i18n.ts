import { createInstance, type i18n } from 'i18next';
import { initReactI18next } from 'react-i18next';
import { resources } from '../../locales/resources.js';
import { DEFAULT_LOCALE, isLocale, type Locale } from './locales.js';
import { setRequestLocale } from './request-locale.js';

/**
 * One i18next instance with every catalogue bundled (they are small), started synchronously so the
 * first render already speaks the chosen language. Plurals use the CLDR categories of
 * Intl.PluralRules (`key_one`, `key_other`); `{{name}}` interpolates values, never sentence parts.
 */
export function createI18n(locale: Locale): i18n {
  const instance = createInstance();
  void instance.use(initReactI18next).init({
    resources,
    lng: locale,
    fallbackLng: DEFAULT_LOCALE,
    defaultNS: 'common',
    ns: Object.keys(resources.en),
    initAsync: false,
    // React escapes every value it renders; escaping here too would show "&amp;".
    interpolation: { escapeValue: false },
    returnNull: false,
  });
  // The API answers in the page's language: the http client reads it for `Accept-Language`.
  setRequestLocale(locale);
  instance.on('languageChanged', (lng) => {
    if (isLocale(lng)) setRequestLocale(lng);
  });
  return instance;
}
