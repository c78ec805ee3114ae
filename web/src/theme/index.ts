export { homegroundTheme, hgTokens } from './homeground-theme.js';
export { useGlobalStyles } from './global-styles.js';
export { useHeadingStyles } from './heading-styles.js';
