import { useCallback } from 'react';
import { useTranslation } from 'react-i18next';
import { forms } from '../../locales/en/forms.js';
import { useLocale } from '../i18n/index.js';

type MessageKey = keyof typeof forms.messages;

/** Each English message as a pattern; `{{count}}` matches the number the schema put there. */
const RULES = (Object.keys(forms.messages) as MessageKey[]).map((key) => {
  const escaped = forms.messages[key].replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace('\\{\\{count\\}\\}', '(\\d+)');
  return { key, pattern: new RegExp(`^${escaped}$`) };
});

/**
 * The shared schemas and the API word their checks in English ("Must be at least 12 characters");
 * this says a known one in the page's language and leaves any other as it came. English passes
 * through untouched.
 */
export function useSchemaMessage(): (message: string) => string {
  const { locale } = useLocale();
  const { t } = useTranslation('forms');
  return useCallback(
    (message: string) => {
      if (locale === 'en') return message;
      for (const { key, pattern } of RULES) {
        const match = pattern.exec(message);
        if (match) return t(`messages.${key}`, { count: Number(match[1] ?? 0) });
      }
      return message;
    },
    [locale, t],
  );
}
