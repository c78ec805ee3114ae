import { Button, makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { LOCALE_NAMES, LOCALES, useLocale } from '../../lib/i18n/index.js';

const useStyles = makeStyles({
  group: { display: 'flex', gap: tokens.spacingHorizontalXXS, flexShrink: 0 },
  button: {
    minWidth: 'auto',
    paddingLeft: tokens.spacingHorizontalS,
    paddingRight: tokens.spacingHorizontalS,
    '@media (max-width: 400px)': { paddingLeft: tokens.spacingHorizontalXS, paddingRight: tokens.spacingHorizontalXS },
  },
  // On a phone only the other language shows: the one you are reading needs no button.
  current: { fontWeight: tokens.fontWeightSemibold, '@media (max-width: 600px)': { display: 'none' } },
});

/**
 * English / Español, each written in its own language (and marked with its `lang`, WCAG 3.1.2) so a
 * reader finds theirs; the pressed one is the page's language. The choice is remembered.
 */
export function LanguageSwitch() {
  const styles = useStyles();
  const { t } = useTranslation();
  const { locale, setLocale } = useLocale();
  return (
    <div role="group" aria-label={t('language.label')} className={styles.group}>
      {LOCALES.map((option) => (
        <Button
          key={option}
          lang={option}
          size="small"
          appearance={option === locale ? 'outline' : 'subtle'}
          aria-pressed={option === locale}
          className={mergeClasses(styles.button, option === locale && styles.current)}
          onClick={() => setLocale(option)}
        >
          {LOCALE_NAMES[option]}
        </Button>
      ))}
    </div>
  );
}
