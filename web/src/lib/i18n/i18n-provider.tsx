import type { i18n } from 'i18next';
import { type ReactNode, useEffect, useState } from 'react';
import { I18nextProvider } from 'react-i18next';
import { createI18n } from './create-i18n.js';
import { initialLocale, LOCALE_TAGS } from './locales.js';
import { useLocale } from './use-locale.js';

/** `<html lang>` follows the chosen language, so screen readers pronounce it right (WCAG 3.1.1). */
function HtmlLang() {
  const { locale } = useLocale();
  useEffect(() => {
    document.documentElement.lang = LOCALE_TAGS[locale];
  }, [locale]);
  return null;
}

/**
 * The app's language: the remembered choice, else the browser's, else English. Tests may pass
 * their own instance (e.g. one started in Spanish).
 */
export function I18nProvider({ instance, children }: { instance?: i18n; children: ReactNode }) {
  const [i18nInstance] = useState(() => instance ?? createI18n(initialLocale()));
  return (
    <I18nextProvider i18n={i18nInstance}>
      <HtmlLang />
      {children}
    </I18nextProvider>
  );
}
