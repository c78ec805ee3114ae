import { makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { NavLink } from 'react-router-dom';
import { NARROW_MEDIA } from './breakpoints.js';
import type { NavItem } from './nav-items.js';

const useStyles = makeStyles({
  nav: { [NARROW_MEDIA]: { display: 'none' } },
  list: { display: 'flex', gap: tokens.spacingHorizontalXS, listStyleType: 'none', margin: 0, padding: 0 },
  link: {
    display: 'block',
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    color: tokens.colorNeutralForeground2,
    fontWeight: tokens.fontWeightSemibold,
    textDecorationLine: 'none',
    whiteSpace: 'nowrap',
    borderBottom: `3px solid transparent`,
    ':hover': { color: tokens.colorBrandForeground1, backgroundColor: tokens.colorNeutralBackground1Hover },
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '1px' },
  },
  active: {
    color: tokens.colorBrandForeground1,
    borderBottomColor: tokens.colorBrandStroke1,
  },
});

/** The inline main navigation on wide screens; NavLink marks the current page with aria-current. */
export function MainNav({ items }: { items: NavItem[] }) {
  const styles = useStyles();
  const { t } = useTranslation();
  return (
    <nav aria-label={t('nav.main')} className={styles.nav}>
      <ul className={styles.list}>
        {items.map((item) => (
          <li key={item.to}>
            <NavLink to={item.to} className={({ isActive }) => mergeClasses(styles.link, isActive && styles.active)}>
              {t(`nav.${item.labelKey}`)}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
