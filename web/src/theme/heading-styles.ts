import { makeStyles, tokens } from '@fluentui/react-components';
import { hgTokens } from './homeground-theme.js';

/**
 * Heading type. Fluent's typography components set font-family by class, which beats a plain
 * `h1 {}` rule, so headings take Merriweather through these classes instead.
 */
export const useHeadingStyles = makeStyles({
  base: {
    fontFamily: hgTokens.hgFontFamilyHeading,
    fontWeight: 700,
    color: tokens.colorNeutralForeground1,
    marginTop: 0,
    marginBottom: tokens.spacingVerticalM,
    textWrap: 'balance',
  },
  page: {
    fontSize: '32px',
    lineHeight: '42px',
    '@media (max-width: 480px)': { fontSize: '26px', lineHeight: '34px' },
  },
  section: {
    fontSize: tokens.fontSizeBase500,
    lineHeight: tokens.lineHeightBase500,
  },
  card: {
    fontSize: tokens.fontSizeBase400,
    lineHeight: tokens.lineHeightBase400,
  },
});
