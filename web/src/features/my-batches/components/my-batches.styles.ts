import { makeStyles, tokens } from '@fluentui/react-components';

/** Styles for a phone in a garden: large targets (at least 48 px), one column, nothing wider than the screen. */
export const useMyBatchesStyles = makeStyles({
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  subheading: { color: tokens.colorNeutralForeground3, margin: `0 0 ${tokens.spacingVerticalM}` },
  facts: { margin: `0 0 ${tokens.spacingVerticalM}`, display: 'grid', gap: tokens.spacingVerticalXS },
  steps: { listStyleType: 'none', padding: 0, margin: 0, display: 'grid', gap: tokens.spacingVerticalS },
  step: {
    display: 'grid',
    gridTemplateColumns: '6.5rem minmax(0, 1fr)',
    columnGap: tokens.spacingHorizontalM,
    '@media (max-width: 480px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  stepDate: { fontWeight: tokens.fontWeightSemibold, fontVariantNumeric: 'tabular-nums' },
  past: { color: tokens.colorNeutralForeground3 },
  next: { borderLeft: `4px solid ${tokens.colorBrandStroke1}`, paddingLeft: tokens.spacingHorizontalS },
  detail: { margin: 0, color: tokens.colorNeutralForeground2 },
  section: { marginTop: tokens.spacingVerticalL },
  after: { marginTop: tokens.spacingVerticalXL },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalXS },
  kinds: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(7.5rem, 1fr))',
    gap: tokens.spacingHorizontalS,
  },
  big: { minHeight: '48px', fontSize: tokens.fontSizeBase400 },
  form: { display: 'grid', gap: tokens.spacingVerticalM, marginTop: tokens.spacingVerticalM },
  field: { maxWidth: '24rem' },
  logTable: { fontVariantNumeric: 'tabular-nums' },
  scroller: { overflowX: 'auto', maxWidth: '100%' },
});
