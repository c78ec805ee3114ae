import { makeStyles, tokens } from '@fluentui/react-components';

/** Styles the season page's cards share. */
export const useSeasonStyles = makeStyles({
  // minmax(0, 1fr): a grid track otherwise grows to its widest table, widening the page on a phone.
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  /** Tables scroll sideways inside their card on a phone instead of widening the page. */
  scroller: { overflowX: 'auto', maxWidth: '100%' },
  table: { minWidth: '560px', fontVariantNumeric: 'tabular-nums' },
  scientific: { fontStyle: 'italic', color: tokens.colorNeutralForeground3, display: 'block' },
  number: { width: '9rem' },
  actions: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'center',
    marginTop: tokens.spacingVerticalL,
  },
  lead: { marginTop: 0, maxWidth: '68ch' },
  facts: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr',
    columnGap: tokens.spacingHorizontalXL,
    rowGap: tokens.spacingVerticalS,
    margin: 0,
    '@media (max-width: 480px)': { gridTemplateColumns: '1fr' },
  },
  term: { fontWeight: tokens.fontWeightSemibold },
  value: { margin: 0 },
  /** Read by screen readers, not shown: the row's species names each input. */
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
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalXS },
});
