import { useCallback } from 'react';
import { useTranslation } from 'react-i18next';
import { schemaSentenceIn } from '@homeground/shared';
import { forms } from '../../locales/en/forms.js';
import { useLocale } from '../i18n/index.js';
import { asSentence } from './field-errors.js';

type MessageKey = keyof typeof forms.messages;

/** Each of the API's own English form messages as a pattern; `{{count}}` matches a number there. */
const RULES = (Object.keys(forms.messages) as MessageKey[]).map((key) => {
  const escaped = forms.messages[key].replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace('\\{\\{count\\}\\}', '(\\d+)');
  return { key, pattern: new RegExp(`^${escaped}$`) };
});

/**
 * The shared schemas and the API word their checks in English ("Must be at least 12 characters");
 * this says a known one in the page's language and leaves any other as it came. A schema's field
 * reason goes through the shared sentence table (`schemaSentenceIn`), the same one the API answers
 * with, so a field says the same words whether the browser or the API caught it. English passes
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
      // Beside a field the reason starts the sentence ("Must …"); the table holds the API's "must …".
      const reason = message.charAt(0).toLowerCase() + message.slice(1);
      const said = schemaSentenceIn(locale, reason);
      if (said === reason) return message;
      return message.charAt(0) === reason.charAt(0) ? said : asSentence(said);
    },
    [locale, t],
  );
}
