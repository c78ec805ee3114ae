import { common as enCommon } from './en/common.js';
import { common as esCommon } from './es/common.js';
import { home as enHome } from './en/home.js';
import { home as esHome } from './es/home.js';
import { ground as enGround } from './en/ground.js';
import { ground as esGround } from './es/ground.js';
import { forms as enForms } from './en/forms.js';
import { forms as esForms } from './es/forms.js';
import { species as enSpecies } from './en/species.js';
import { species as esSpecies } from './es/species.js';
import { detail as enDetail } from './en/detail.js';
import { detail as esDetail } from './es/detail.js';
import { cards as enCards } from './en/cards.js';
import { cards as esCards } from './es/cards.js';
import { yard as enYard } from './en/yard.js';
import { yard as esYard } from './es/yard.js';
import { report as enReport } from './en/report.js';
import { report as esReport } from './es/report.js';

/** Every message catalogue by language and namespace (one namespace per area of the app). */
export const resources = {
  en: {
    common: enCommon,
    home: enHome,
    ground: enGround,
    forms: enForms,
    species: enSpecies,
    detail: enDetail,
    cards: enCards,
    yard: enYard,
    report: enReport,
  },
  es: {
    common: esCommon,
    home: esHome,
    ground: esGround,
    forms: esForms,
    species: esSpecies,
    detail: esDetail,
    cards: esCards,
    yard: esYard,
    report: esReport,
  },
} as const;
