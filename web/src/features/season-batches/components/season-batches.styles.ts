import { makeStyles, tokens } from '@fluentui/react-components';

export const useSeasonBatchesStyles = makeStyles({
  stack: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr)',
    gap: tokens.spacingVerticalXL,
    marginTop: tokens.spacingVerticalXL,
  },
  scroller: { overflowX: 'auto', maxWidth: '100%' },
  table: { minWidth: '640px', fontVariantNumeric: 'tabular-nums' },
  lead: { marginTop: 0, maxWidth: '68ch' },
  muted: { color: tokens.colorNeutralForeground3, display: 'block' },
  short: { color: tokens.colorPaletteDarkOrangeForeground1 },
  number: { width: '6rem' },
  actions: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'center',
    marginTop: tokens.spacingVerticalL,
  },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalXS },
});
