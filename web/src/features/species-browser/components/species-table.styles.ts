import { makeStyles, tokens } from '@fluentui/react-components';
import { hgTokens } from '../../../theme/index.js';

export const useTableStyles = makeStyles({
  // Said in words only where the table is wider than the screen.
  scrollHint: {
    display: 'none',
    margin: `0 0 ${tokens.spacingVerticalS}`,
    fontSize: tokens.fontSizeBase200,
    color: tokens.colorNeutralForeground2,
    '@media (max-width: 760px)': { display: 'block' },
  },
  // The table scrolls sideways inside its own box at phone width, never the page.
  scroller: {
    overflowX: 'auto',
    maxWidth: '100%',
    borderRadius: tokens.borderRadiusXLarge,
    boxShadow: tokens.shadow4,
    backgroundColor: tokens.colorNeutralBackground1,
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px' },
  },
  table: {
    width: '100%',
    borderCollapse: 'separate',
    borderSpacing: 0,
    fontSize: tokens.fontSizeBase300,
    fontVariantNumeric: 'tabular-nums',
  },
  th: {
    textAlign: 'left',
    verticalAlign: 'bottom',
    fontWeight: tokens.fontWeightSemibold,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalS}`,
    borderBottom: `1px solid ${tokens.colorNeutralStroke1}`,
    backgroundColor: tokens.colorNeutralBackground1,
    color: hgTokens.hgColorLoam,
  },
  td: {
    verticalAlign: 'top',
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalS}`,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
  },
  // The common name stays in view while the other columns scroll past it on a phone.
  sticky: {
    position: 'sticky',
    left: 0,
    zIndex: 1,
    backgroundColor: tokens.colorNeutralBackground1,
    minWidth: '140px',
    maxWidth: '220px',
    // Narrower on a phone so height, bloom and sun fit beside it at 390 px.
    '@media (max-width: 600px)': { minWidth: '96px', maxWidth: '128px' },
  },
  rowHeader: { textAlign: 'left', fontWeight: tokens.fontWeightRegular },
  nowrap: { whiteSpace: 'nowrap' },
  sortButton: {
    display: 'inline-flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalXS,
    border: 'none',
    background: 'none',
    padding: 0,
    margin: 0,
    font: 'inherit',
    textAlign: 'left',
    color: 'inherit',
    cursor: 'pointer',
    ':hover': { color: tokens.colorBrandForeground1, textDecorationLine: 'underline' },
    ':focus-visible': {
      outline: `2px solid ${tokens.colorStrokeFocus2}`,
      outlineOffset: '2px',
      borderRadius: tokens.borderRadiusSmall,
    },
  },
  muted: { color: tokens.colorNeutralForeground3 },
  scientific: { fontStyle: 'italic' },
  nameLink: { fontWeight: tokens.fontWeightSemibold },
  bloomCell: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS, whiteSpace: 'nowrap' },
  small: { fontSize: tokens.fontSizeBase200, color: tokens.colorNeutralForeground2 },
  caution: { display: 'flex', gap: tokens.spacingHorizontalXS, alignItems: 'flex-start', minWidth: '140px' },
  cautionIcon: { color: tokens.colorStatusWarningForeground1, flexShrink: 0, marginTop: '2px' },
  yes: { display: 'inline-flex', gap: tokens.spacingHorizontalXXS, alignItems: 'center' },
  yesIcon: { color: tokens.colorBrandForeground1 },
  number: { textAlign: 'right' },
});
