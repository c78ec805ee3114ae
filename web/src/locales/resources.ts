import { common as enCommon } from './en/common.js';
import { common as esCommon } from './es/common.js';
import { home as enHome } from './en/home.js';
import { home as esHome } from './es/home.js';

/** Every message catalogue by language and namespace (one namespace per area of the app). */
export const resources = {
  en: { common: enCommon, home: enHome },
  es: { common: esCommon, home: esHome },
} as const;
