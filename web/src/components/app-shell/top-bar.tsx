import { makeStyles, tokens } from '@fluentui/react-components';
import type { User } from '@homeground/shared';
import { AccountArea, type AccountAreaStatus } from './account-area.js';
import { LanguageSwitch } from './language-switch.js';
import { MainNav } from './main-nav.js';
import { NavMenuButton } from './nav-menu-button.js';
import { visibleNavItems } from './nav-items.js';
import { Wordmark } from './wordmark.js';

const useStyles = makeStyles({
  header: {
    backgroundColor: tokens.colorNeutralBackground1,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
    boxShadow: tokens.shadow2,
  },
  bar: {
    boxSizing: 'border-box',
    maxWidth: '1200px',
    margin: '0 auto',
    minHeight: '60px',
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalL}`,
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    '@media (max-width: 480px)': {
      padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalS}`,
      gap: tokens.spacingHorizontalXS,
    },
  },
  spacer: { flexGrow: 1 },
});

export interface TopBarProps {
  status: AccountAreaStatus;
  user: User | null;
  onSignOut: () => void;
}

/** Wordmark, main navigation (or its menu button on narrow screens), the language switch and the account area. */
export function TopBar({ status, user, onSignOut }: TopBarProps) {
  const styles = useStyles();
  const items = visibleNavItems(user);
  return (
    <header className={styles.header}>
      <div className={styles.bar}>
        <NavMenuButton items={items} />
        <Wordmark />
        <MainNav items={items} />
        <div className={styles.spacer} />
        <LanguageSwitch />
        <AccountArea status={status} user={user} onSignOut={onSignOut} />
      </div>
    </header>
  );
}
