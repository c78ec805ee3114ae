import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { Info20Regular } from '@fluentui/react-icons';
import type { SpeciesDetail } from '../../../api/species/species.api.js';
import { hgTokens } from '../../../theme/index.js';
import { useWords } from '../../../lib/i18n/index.js';

const useStyles = makeStyles({
  root: {
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    padding: tokens.spacingVerticalM,
    borderRadius: tokens.borderRadiusXLarge,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: tokens.colorNeutralBackground1,
    color: hgTokens.hgColorLoam,
  },
  icon: { flexShrink: 0, marginTop: '2px' },
  text: { margin: `0 0 ${tokens.spacingVerticalXS}` },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL },
});

/** Before-you-plant words: the rules that differ by place, and handling care for the chosen plants. */
export function PrintReminder({ species }: { species: readonly SpeciesDetail[] }) {
  const styles = useStyles();
  const { t } = useTranslation('cards');
  const words = useWords();
  const withCautions = species.filter((s) => s.cautions.length > 0);
  const hasSap = species.some((s) => s.cautions.some((c) => c.kind === 'sap-irritant'));
  return (
    <aside className={styles.root} aria-label={t('reminder.label')}>
      <Info20Regular className={styles.icon} aria-hidden />
      <div>
        <p className={styles.text}>{t('reminder.rules')}</p>
        <p className={styles.text}>
          {hasSap ? t('reminder.sap') : t('reminder.gloves')} {t('reminder.toxic')}
        </p>
        {withCautions.length > 0 ? (
          <ul className={styles.list} aria-label={t('reminder.list')}>
            {withCautions.map((s) => (
              <li key={s.slug}>
                {s.commonNames[0]}: {words.cautionList(s.cautions.map((c) => c.kind))}
              </li>
            ))}
          </ul>
        ) : null}
      </div>
    </aside>
  );
}
