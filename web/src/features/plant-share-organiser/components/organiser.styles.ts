import { makeStyles, tokens } from '@fluentui/react-components';

/** Styles the organiser's plant-share cards share. */
export const useOrganiserStyles = makeStyles({
  // minmax(0, 1fr): a grid track otherwise grows to its widest table, widening the page on a phone.
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  scroller: { overflowX: 'auto', maxWidth: '100%' },
  table: { minWidth: '560px', fontVariantNumeric: 'tabular-nums' },
  /** Three short columns fit a phone; the tick box column stays narrow. */
  pickupTable: { fontVariantNumeric: 'tabular-nums', '& th:first-child, & td:first-child': { width: '4rem' } },
  scientific: { fontStyle: 'italic', color: tokens.colorNeutralForeground3, display: 'block' },
  number: { width: '6.5rem' },
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
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalXS },
  big: { minHeight: '44px' },
  rows: {
    listStyle: 'none',
    margin: `0 0 ${tokens.spacingVerticalL}`,
    padding: 0,
    display: 'grid',
    gap: tokens.spacingVerticalS,
  },
  row: { display: 'flex', justifyContent: 'space-between', alignItems: 'center', gap: tokens.spacingHorizontalM },
  muted: { color: tokens.colorNeutralForeground3 },
});
