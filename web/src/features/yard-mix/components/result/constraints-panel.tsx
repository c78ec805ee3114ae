import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { CheckmarkCircle20Filled, DismissCircle20Regular, Info20Regular } from '@fluentui/react-icons';
import type { PaletteConstraint } from '@homeground/shared';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalM },
  item: {
    display: 'grid',
    gridTemplateColumns: 'auto 1fr',
    gap: `0 ${tokens.spacingHorizontalS}`,
    alignItems: 'start',
  },
  met: { color: tokens.colorStatusSuccessForeground1 },
  unmet: { color: tokens.colorStatusWarningForeground3 },
  na: { color: tokens.colorNeutralForeground3 },
  rule: { margin: 0, fontWeight: tokens.fontWeightSemibold },
  status: { fontWeight: tokens.fontWeightBold },
  detail: { margin: 0, color: tokens.colorNeutralForeground2 },
  source: { margin: 0, color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
});

/** Where each rule comes from, for the source note only (program names never in the rule itself). */
const SOURCE_KEYS = {
  'nrcs-cp42-indiana-2012': 'rules.sources.cp42',
  'nrcs-e327136z2': 'rules.sources.monarch',
  'common-practice': 'rules.sources.common',
} as const;

function isKnownSource(source: string): source is keyof typeof SOURCE_KEYS {
  return Object.hasOwn(SOURCE_KEYS, source);
}

function statusOf(c: PaletteConstraint): 'met' | 'unmet' | 'na' {
  if (!c.applies) return 'na';
  return c.met ? 'met' : 'unmet';
}

/** Each design rule checked on the mix, met or not, in words beside the icon. */
export function ConstraintsPanel({ constraints }: { constraints: readonly PaletteConstraint[] }) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  // Rules that apply first, so the ones to act on are not buried under "does not apply".
  const ordered = [...constraints].sort((a, b) => Number(b.applies) - Number(a.applies));
  return (
    <ul className={styles.list} aria-label={t('rules.label')}>
      {ordered.map((c) => {
        const status = statusOf(c);
        const Icon =
          status === 'met' ? CheckmarkCircle20Filled : status === 'unmet' ? DismissCircle20Regular : Info20Regular;
        return (
          <li key={c.id} className={styles.item} data-constraint={c.id} data-status={status}>
            <Icon aria-hidden className={styles[status]} />
            <div>
              <p className={styles.rule}>
                <span className={mergeClasses(styles.status, styles[status])}>{t(`rules.${status}`)}:</span> {c.rule}
              </p>
              <p className={styles.detail}>{c.detail}</p>
              <p className={styles.source}>
                {t('rules.source', { source: isKnownSource(c.source) ? t(SOURCE_KEYS[c.source]) : c.source })}
              </p>
            </div>
          </li>
        );
      })}
    </ul>
  );
}
