import { makeStyles } from '@fluentui/react-components';

/**
 * A native <select> is as wide as its longest option ("85 · Southern Rockies…") unless told
 * otherwise; these keep it inside its grid cell and cut long names with an ellipsis.
 */
export const useSelectStyles = makeStyles({
  root: { width: '100%', minWidth: 0 },
  select: { width: '100%', minWidth: 0, textOverflow: 'ellipsis' },
});
