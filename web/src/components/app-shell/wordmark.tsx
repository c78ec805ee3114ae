import { makeStyles, tokens } from '@fluentui/react-components';
import { Link as RouterDomLink } from 'react-router-dom';
import { paths } from '../../config/paths.js';
import { hgTokens } from '../../theme/index.js';
import { SeedlingGlyph } from './seedling-glyph.js';

const useStyles = makeStyles({
  link: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    textDecorationLine: 'none',
    color: tokens.colorBrandForeground1,
    borderRadius: tokens.borderRadiusMedium,
    flexShrink: 0,
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px' },
  },
  word: {
    fontFamily: hgTokens.hgFontFamilyHeading,
    fontWeight: 700,
    fontSize: '20px',
    lineHeight: '28px',
    color: tokens.colorNeutralForeground1,
    // Room for the language switch and sign-in beside it on a 360 px phone.
    '@media (max-width: 400px)': { fontSize: '17px' },
  },
});

/** "Homeground" in Merriweather beside the seedling; links home. */
export function Wordmark() {
  const styles = useStyles();
  return (
    <RouterDomLink to={paths.home.build()} className={styles.link}>
      <SeedlingGlyph />
      <span className={styles.word}>Homeground</span>
    </RouterDomLink>
  );
}
