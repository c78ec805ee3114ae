export { SpeciesBrowser } from './components/species-browser.js';
/** The bloom strip is also drawn on the species page; routes hand it to the detail feature. */
export { BloomStrip, type BloomStripProps } from './components/bloom-strip.js';
export { speciesBrowserLoader } from './utils/browser-loader.js';
