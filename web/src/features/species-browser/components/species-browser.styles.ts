import { makeStyles, tokens } from '@fluentui/react-components';
import { hgTokens } from '../../../theme/index.js';

export const useBrowserStyles = makeStyles({
  filterToggle: {
    display: 'none',
    marginBottom: tokens.spacingVerticalM,
    '@media (max-width: 640px)': { display: 'block' },
  },
  filters: { marginBottom: tokens.spacingVerticalXXL },
  // On a phone the filters fold away behind their button so the results come first.
  filtersFolded: { '@media (max-width: 640px)': { display: 'none' } },
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalM,
  },
  count: { margin: 0 },
  heading: { marginBottom: 0, ':focus': { outlineStyle: 'none' } },
  range: { margin: `${tokens.spacingVerticalXXS} 0 0`, color: hgTokens.hgColorLoam },
  tools: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalM },
  updating: { display: 'inline-flex', alignItems: 'center' },
  stale: { opacity: 0.6, transitionProperty: 'opacity', transitionDuration: tokens.durationNormal },
  notes: {
    margin: `${tokens.spacingVerticalM} 0 0`,
    color: hgTokens.hgColorLoam,
    fontSize: tokens.fontSizeBase200,
    maxWidth: '80ch',
  },
  skeletonRow: { marginBottom: tokens.spacingVerticalM },
  emptyAction: { marginTop: tokens.spacingVerticalM },
});
