import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { CheckmarkCircle20Filled, DismissCircle20Regular, Info20Regular } from '@fluentui/react-icons';
import type { PaletteConstraint } from '@homeground/shared';

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
const SOURCE_WORDS: Record<string, string> = {
  'nrcs-cp42-indiana-2012': 'USDA NRCS pollinator habitat practice (CP42)',
  'nrcs-e327136z2': 'USDA NRCS monarch habitat enhancement (E327136Z2)',
  'common-practice': 'common practice among native-plant gardeners',
};

function statusOf(c: PaletteConstraint): 'met' | 'unmet' | 'na' {
  if (!c.applies) return 'na';
  return c.met ? 'met' : 'unmet';
}

const STATUS_WORDS = { met: 'Met', unmet: 'Not met', na: 'Does not apply' } as const;

/** Each design rule checked on the mix, met or not, in words beside the icon. */
export function ConstraintsPanel({ constraints }: { constraints: readonly PaletteConstraint[] }) {
  const styles = useStyles();
  // Rules that apply first, so the ones to act on are not buried under "does not apply".
  const ordered = [...constraints].sort((a, b) => Number(b.applies) - Number(a.applies));
  return (
    <ul className={styles.list} aria-label="How this mix is balanced">
      {ordered.map((c) => {
        const status = statusOf(c);
        const Icon =
          status === 'met' ? CheckmarkCircle20Filled : status === 'unmet' ? DismissCircle20Regular : Info20Regular;
        return (
          <li key={c.id} className={styles.item} data-constraint={c.id} data-status={status}>
            <Icon aria-hidden className={styles[status]} />
            <div>
              <p className={styles.rule}>
                <span className={mergeClasses(styles.status, styles[status])}>{STATUS_WORDS[status]}:</span> {c.rule}
              </p>
              <p className={styles.detail}>{c.detail}</p>
              <p className={styles.source}>Source: {SOURCE_WORDS[c.source] ?? c.source}</p>
            </div>
          </li>
        );
      })}
    </ul>
  );
}
