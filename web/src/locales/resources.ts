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
import { editor as enEditor } from './en/editor.js';
import { editor as esEditor } from './es/editor.js';
import { reference as enReference } from './en/reference.js';
import { reference as esReference } from './es/reference.js';
import { importer as enImporter } from './en/importer.js';
import { importer as esImporter } from './es/importer.js';
import { people as enPeople } from './en/people.js';
import { people as esPeople } from './es/people.js';
import { history as enHistory } from './en/history.js';
import { history as esHistory } from './es/history.js';
import { mix as enMix } from './en/mix.js';
import { mix as esMix } from './es/mix.js';
import { groups as enGroups } from './en/groups.js';
import { groups as esGroups } from './es/groups.js';
import { batches as enBatches } from './en/batches.js';
import { batches as esBatches } from './es/batches.js';
import { seasonBatches as enSeasonBatches } from './en/season-batches.js';
import { seasonBatches as esSeasonBatches } from './es/season-batches.js';
import { season as enSeason } from './en/season.js';
import { season as esSeason } from './es/season.js';
import { report as enReport } from './en/report.js';
import { report as esReport } from './es/report.js';
import { taker as enTaker } from './en/taker.js';
import { taker as esTaker } from './es/taker.js';
import { organiser as enOrganiser } from './en/organiser.js';
import { organiser as esOrganiser } from './es/organiser.js';

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
    editor: enEditor,
    reference: enReference,
    importer: enImporter,
    people: enPeople,
    history: enHistory,
    mix: enMix,
    groups: enGroups,
    batches: enBatches,
    seasonBatches: enSeasonBatches,
    season: enSeason,
    report: enReport,
    taker: enTaker,
    organiser: enOrganiser,
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
    editor: esEditor,
    reference: esReference,
    importer: esImporter,
    people: esPeople,
    history: esHistory,
    mix: esMix,
    groups: esGroups,
    batches: esBatches,
    seasonBatches: esSeasonBatches,
    season: esSeason,
    report: esReport,
    taker: esTaker,
    organiser: esOrganiser,
  },
} as const;
