import { useTranslation } from 'react-i18next';
import { useWords } from '../../../../lib/i18n/index.js';
import { makeStyles, tokens } from '@fluentui/react-components';
import { Warning16Regular } from '@fluentui/react-icons';
import type { SpeciesCaution } from '../../hooks/use-mix-cautions.js';

const useStyles = makeStyles({
  list: {
    listStyle: 'none',
    margin: `${tokens.spacingVerticalXS} 0 0`,
    padding: 0,
    display: 'grid',
    gap: tokens.spacingVerticalXXS,
  },
  item: {
    display: 'flex',
    gap: tokens.spacingHorizontalXS,
    alignItems: 'flex-start',
    fontSize: tokens.fontSizeBase200,
    color: tokens.colorNeutralForeground1,
  },
  icon: { flexShrink: 0, marginTop: '2px', color: tokens.colorStatusWarningForeground3 },
});

/** Cautions where the species appears: calm and specific, with a word before the icon so colour is not needed. */
export function SpeciesCautions({ name, cautions }: { name: string; cautions: readonly SpeciesCaution[] | undefined }) {
  const styles = useStyles();
  const { t } = useTranslation('yard');
  const words = useWords();
  if (!cautions || cautions.length === 0) return null;
  return (
    <ul className={styles.list} aria-label={t('mix.cautionsFor', { name })}>
      {cautions.map((c) => (
        <li key={c.kind} className={styles.item}>
          <Warning16Regular className={styles.icon} aria-hidden />
          <span>
            <strong>{t('mix.caution')}</strong>{' '}
            {/* The record's sentence is English; other languages give the vocabulary's own. */}
            {words.locale === 'en' ? c.text : words.caution[c.kind].sentence}
          </span>
        </li>
      ))}
    </ul>
  );
}
