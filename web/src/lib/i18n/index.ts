export * from './create-i18n.js';
export * from './format.js';
export * from './locales.js';
export * from './use-locale.js';
export * from './use-words.js';
export * from './i18n-provider.js';
export * from './request-locale.js';
