import { Outlet, useNavigate, useNavigation } from 'react-router-dom';
import { AppShell } from '../components/app-shell/app-shell.js';
import { paths } from '../config/paths.js';
import { useSession } from '../features/auth/hooks/use-session.js';

/** Every page sits in the shell; the session decides the account area and which entries show. */
export function RootLayout() {
  const session = useSession();
  const navigate = useNavigate();
  const navigation = useNavigation();

  const signOut = () => {
    session.signOut();
    navigate(paths.home.build());
  };

  return (
    <AppShell
      status={session.status}
      user={session.user}
      onSignOut={signOut}
      isNavigating={navigation.state === 'loading'}
    >
      <Outlet />
    </AppShell>
  );
}
