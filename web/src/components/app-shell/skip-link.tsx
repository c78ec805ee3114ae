import { makeStyles, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  link: {
    position: 'absolute',
    left: tokens.spacingHorizontalM,
    top: '-200px',
    zIndex: 100,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorBrandForeground1,
    fontWeight: tokens.fontWeightSemibold,
    borderRadius: tokens.borderRadiusMedium,
    boxShadow: tokens.shadow8,
    ':focus': { top: tokens.spacingVerticalM, outline: `2px solid ${tokens.colorStrokeFocus2}` },
  },
});

/** First stop for keyboard users: jumps past the top bar (WCAG 2.4.1 Bypass Blocks). */
export function SkipLink({ targetId }: { targetId: string }) {
  const styles = useStyles();
  const { t } = useTranslation();
  return (
    <a href={`#${targetId}`} className={styles.link}>
      {t('shell.skip')}
    </a>
  );
}
