import { makeStyles, tokens } from '@fluentui/react-components';

/** A diagonal hatch marks gap months, so the gap shows without relying on colour. */
const GAP_HATCH = `repeating-linear-gradient(135deg, ${tokens.colorStatusWarningBackground2} 0 3px, ${tokens.colorNeutralBackground1} 3px 7px)`;

export const useBloomChartStyles = makeStyles({
  scroller: {
    // Positioned, so the absolutely placed screen-reader words inside scroll with the table
    // instead of widening the page.
    position: 'relative',
    overflowX: 'auto',
    maxWidth: '100%',
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px' },
  },
  table: { borderCollapse: 'separate', borderSpacing: '2px', width: '100%', fontSize: tokens.fontSizeBase200 },
  caption: { margin: `0 0 ${tokens.spacingVerticalS}`, color: tokens.colorNeutralForeground2, maxWidth: '68ch' },
  nameHead: { textAlign: 'left', fontWeight: tokens.fontWeightSemibold, padding: `0 ${tokens.spacingHorizontalS} 0 0` },
  rowHead: {
    textAlign: 'left',
    fontWeight: tokens.fontWeightRegular,
    padding: `2px ${tokens.spacingHorizontalS} 2px 0`,
    minWidth: '7rem',
    maxWidth: '14rem',
    // At 390 px the twelve months fit beside the names without scrolling, whichever language's cell labels.
    '@media (max-width: 480px)': { minWidth: '5rem', maxWidth: '7rem' },
    lineHeight: tokens.lineHeightBase200,
  },
  notCounted: { display: 'block', color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase100 },
  monthHead: {
    minWidth: '22px',
    '@media (max-width: 480px)': { minWidth: '14px' },
    textAlign: 'center',
    fontWeight: tokens.fontWeightSemibold,
    verticalAlign: 'bottom',
    padding: 0,
  },
  monthLong: { '@media (max-width: 640px)': { display: 'none' } },
  monthShort: { display: 'none', '@media (max-width: 640px)': { display: 'inline' } },
  gapFlag: {
    display: 'block',
    fontSize: tokens.fontSizeBase100,
    fontWeight: tokens.fontWeightBold,
    color: tokens.colorStatusWarningForeground3,
    textTransform: 'uppercase',
    // On a phone the flag reads bottom to top, so a longer word ("hueco") keeps the month narrow.
    '@media (max-width: 480px)': { writingMode: 'vertical-rl', transform: 'rotate(180deg)', margin: '0 auto' },
  },
  cell: {
    height: '26px',
    minWidth: '22px',
    '@media (max-width: 480px)': { minWidth: '14px' },
    textAlign: 'center',
    borderRadius: tokens.borderRadiusSmall,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: tokens.colorNeutralBackground3,
    padding: 0,
  },
  bloom: {
    fontWeight: tokens.fontWeightSemibold,
    fontSize: tokens.fontSizeBase100,
    border: `1px solid ${tokens.colorNeutralStroke1}`,
  },
  gap: { backgroundImage: GAP_HATCH },
  countHead: { textAlign: 'left', fontWeight: tokens.fontWeightSemibold, paddingTop: tokens.spacingVerticalXS },
  count: { textAlign: 'center', paddingTop: tokens.spacingVerticalXS, color: tokens.colorNeutralForeground2 },
  countGap: { color: tokens.colorStatusWarningForeground3, fontWeight: tokens.fontWeightBold },
  legend: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalL}`,
    listStyle: 'none',
    padding: 0,
    margin: `${tokens.spacingVerticalM} 0`,
    fontSize: tokens.fontSizeBase200,
  },
  legendItem: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  swatch: {
    display: 'inline-flex',
    alignItems: 'center',
    justifyContent: 'center',
    width: '26px',
    height: '20px',
    borderRadius: tokens.borderRadiusSmall,
    border: `1px solid ${tokens.colorNeutralStroke1}`,
    fontSize: tokens.fontSizeBase100,
    fontWeight: tokens.fontWeightSemibold,
  },
  summary: { margin: 0, maxWidth: '68ch' },
  visuallyHidden: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    margin: '-1px',
    overflow: 'hidden',
    clip: 'rect(0 0 0 0)',
    whiteSpace: 'nowrap',
    border: 0,
    padding: 0,
  },
});
