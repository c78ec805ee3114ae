import { common as enCommon } from './en/common.js';
import { common as esCommon } from './es/common.js';

/** Every message catalogue by language and namespace (one namespace per area of the app). */
export const resources = {
  en: { common: enCommon },
  es: { common: esCommon },
} as const;
