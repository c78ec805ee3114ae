import type { resources } from '../../locales/resources.js';

// Typed keys: `t('nav.species')` is checked against the English catalogues at compile time.
declare module 'i18next' {
  interface CustomTypeOptions {
    defaultNS: 'common';
    resources: (typeof resources)['en'];
  }
}
