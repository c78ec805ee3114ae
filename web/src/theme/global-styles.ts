import { makeStaticStyles } from '@fluentui/react-components';
import { homegroundExtras } from './homeground-theme.js';

/**
 * Page-wide rules Fluent does not set: paper behind everything (also outside the provider's
 * element, e.g. when the page scrolls past it) and tabular figures so columns of counts line up.
 */
export const useGlobalStyles = makeStaticStyles({
  body: {
    margin: 0,
    backgroundColor: homegroundExtras.hgColorPaper,
  },
  table: {
    fontVariantNumeric: 'tabular-nums',
  },
});
