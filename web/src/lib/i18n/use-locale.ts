import { useTranslation } from 'react-i18next';
import { DEFAULT_LOCALE, isLocale, type Locale, rememberLocale } from './locales.js';

/** The language the page speaks now, and a way to change it (remembered for the next visit). */
export function useLocale(): { locale: Locale; setLocale: (locale: Locale) => void } {
  const { i18n } = useTranslation();
  const current = i18n.resolvedLanguage ?? i18n.language;
  return {
    locale: isLocale(current) ? current : DEFAULT_LOCALE,
    setLocale: (locale) => {
      rememberLocale(locale);
      void i18n.changeLanguage(locale);
    },
  };
}
