import {
  Avatar,
  Button,
  makeStyles,
  Menu,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
  Spinner,
  tokens,
} from '@fluentui/react-components';
import { People20Regular, Person20Regular, SignOut20Regular } from '@fluentui/react-icons';
import type { User } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useLocation, useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths.js';
import { RouterButton } from '../links/router-link.js';

const useStyles = makeStyles({
  name: {
    maxWidth: '16ch',
    overflow: 'hidden',
    textOverflow: 'ellipsis',
    whiteSpace: 'nowrap',
    // The avatar's initials are enough on a phone; the name stays for screen readers.
    '@media (max-width: 520px)': {
      position: 'absolute',
      width: '1px',
      height: '1px',
      overflow: 'hidden',
      clipPath: 'inset(50%)',
    },
  },
  trigger: { gap: tokens.spacingHorizontalS },
  // Fluent's 96 px minimum leaves no room for the language switch on a 360 px phone.
  signIn: { '@media (max-width: 400px)': { minWidth: 'auto' } },
});

export type AccountAreaStatus = 'signed-out' | 'loading' | 'signed-in' | 'unavailable';

interface AccountAreaProps {
  status: AccountAreaStatus;
  user: User | null;
  onSignOut: () => void;
}

/** Sign-in link when signed out; otherwise the person's name opening an account menu. */
export function AccountArea({ status, user, onSignOut }: AccountAreaProps) {
  const styles = useStyles();
  const { t } = useTranslation();
  const navigate = useNavigate();
  const { pathname, search } = useLocation();

  if (status === 'signed-out') {
    const onAuthPage = pathname === paths.signIn.path || pathname === paths.register.path;
    return (
      <RouterButton
        to={onAuthPage ? paths.signIn.build() : paths.signIn.build(pathname + search)}
        appearance="outline"
        className={styles.signIn}
      >
        {t('account.signIn')}
      </RouterButton>
    );
  }
  if (status === 'loading') return <Spinner size="tiny" label={t('account.checking')} labelPosition="after" />;

  const name = user?.displayName ?? t('account.yourAccount');
  return (
    <Menu>
      <MenuTrigger disableButtonEnhancement>
        <Button appearance="subtle" className={styles.trigger} aria-label={t('account.menuLabel', { name })}>
          {/* No initials: axe-core counts them as visible text missing from the button's name (WCAG 2.5.3). */}
          <Avatar size={28} color="brand" aria-hidden />
          <span className={styles.name}>{name}</span>
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuItem icon={<Person20Regular />} onClick={() => navigate(paths.account.build())}>
            {t('account.yourAccount')}
          </MenuItem>
          {user?.role === 'admin' ? (
            <MenuItem icon={<People20Regular />} onClick={() => navigate(paths.people.build())}>
              People
            </MenuItem>
          ) : null}
          <MenuItem icon={<SignOut20Regular />} onClick={onSignOut}>
            {t('account.signOut')}
          </MenuItem>
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
