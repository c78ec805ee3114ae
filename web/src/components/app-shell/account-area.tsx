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
  const navigate = useNavigate();
  const { pathname, search } = useLocation();

  if (status === 'signed-out') {
    const onAuthPage = pathname === paths.signIn.path || pathname === paths.register.path;
    return (
      <RouterButton to={onAuthPage ? paths.signIn.build() : paths.signIn.build(pathname + search)} appearance="outline">
        Sign in
      </RouterButton>
    );
  }
  if (status === 'loading') return <Spinner size="tiny" label="Checking your sign-in" labelPosition="after" />;

  const name = user?.displayName ?? 'Your account';
  return (
    <Menu>
      <MenuTrigger disableButtonEnhancement>
        <Button appearance="subtle" className={styles.trigger} aria-label={`Your account: ${name}`}>
          <Avatar name={user?.displayName} size={28} color="brand" aria-hidden />
          <span className={styles.name}>{name}</span>
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuItem icon={<Person20Regular />} onClick={() => navigate(paths.account.build())}>
            Your account
          </MenuItem>
          {user?.role === 'admin' ? (
            <MenuItem icon={<People20Regular />} onClick={() => navigate(paths.people.build())}>
              People
            </MenuItem>
          ) : null}
          <MenuItem icon={<SignOut20Regular />} onClick={onSignOut}>
            Sign out
          </MenuItem>
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
