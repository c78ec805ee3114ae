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
  /** Read by screen readers, not shown: the row already names the species and grower. */
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
  mailForm: {
    display: 'grid',
    gap: tokens.spacingVerticalM,
    maxWidth: '28rem',
    marginBottom: tokens.spacingVerticalL,
  },
});
