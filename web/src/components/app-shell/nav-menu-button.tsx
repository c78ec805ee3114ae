import { Button, makeStyles, Menu, MenuItem, MenuList, MenuPopover, MenuTrigger } from '@fluentui/react-components';
import { Navigation24Regular } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import { useLocation, useNavigate } from 'react-router-dom';
import { NARROW_MEDIA } from './breakpoints.js';
import type { NavItem } from './nav-items.js';

const useStyles = makeStyles({
  trigger: { display: 'none', [NARROW_MEDIA]: { display: 'inline-flex' } },
});

/** The main navigation folded into one button for narrow screens (down to 360 px wide). */
export function NavMenuButton({ items }: { items: NavItem[] }) {
  const styles = useStyles();
  const { t } = useTranslation();
  const navigate = useNavigate();
  const { pathname } = useLocation();
  return (
    <Menu>
      <MenuTrigger disableButtonEnhancement>
        <Button
          className={styles.trigger}
          appearance="subtle"
          icon={<Navigation24Regular />}
          aria-label={t('nav.menu')}
        />
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          {items.map((item) => (
            <MenuItem
              key={item.to}
              aria-current={pathname.startsWith(item.to) ? 'page' : undefined}
              onClick={() => navigate(item.to)}
            >
              {t(`nav.${item.labelKey}`)}
            </MenuItem>
          ))}
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
