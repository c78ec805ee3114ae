import { makeStyles, ProgressBar, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { hgTokens } from '../../theme/index.js';
import { SkipLink } from './skip-link.js';
import { TopBar, type TopBarProps } from './top-bar.js';

export const MAIN_CONTENT_ID = 'main-content';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    display: 'flex',
    flexDirection: 'column',
    backgroundColor: hgTokens.hgColorPaper,
    color: tokens.colorNeutralForeground1,
    fontFamily: tokens.fontFamilyBase,
  },
  progress: { height: '2px' },
  main: {
    boxSizing: 'border-box',
    width: '100%',
    maxWidth: '1200px',
    margin: '0 auto',
    flexGrow: 1,
    padding: `${tokens.spacingVerticalXXXL} ${tokens.spacingHorizontalL}`,
    ':focus': { outlineStyle: 'none' },
    '@media (max-width: 480px)': { padding: `${tokens.spacingVerticalXL} ${tokens.spacingHorizontalM}` },
  },
  footer: {
    boxSizing: 'border-box',
    maxWidth: '1200px',
    width: '100%',
    margin: '0 auto',
    padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalL}`,
    color: hgTokens.hgColorLoam,
    fontSize: tokens.fontSizeBase200,
  },
});

interface AppShellProps extends TopBarProps {
  /** True while the router fetches the next page's code or data. */
  isNavigating: boolean;
  children: ReactNode;
}

/** The frame around every page: skip link, top bar, a 1200 px column of content on paper. */
export function AppShell({ isNavigating, children, ...topBar }: AppShellProps) {
  const styles = useStyles();
  const { t } = useTranslation();
  return (
    <div className={styles.root}>
      <SkipLink targetId={MAIN_CONTENT_ID} />
      <TopBar {...topBar} />
      <div className={styles.progress}>
        {isNavigating ? <ProgressBar thickness="medium" aria-label={t('shell.loadingPage')} /> : null}
      </div>
      <main id={MAIN_CONTENT_ID} tabIndex={-1} className={styles.main}>
        {children}
      </main>
      <footer className={styles.footer}>{t('shell.footer')}</footer>
    </div>
  );
}
