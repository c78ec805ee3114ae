export {
  loadCatalogue,
  readCatalogue,
  DATA_DIR,
  type Catalogue,
  type DataProblem,
  type FamilyRealignment,
} from './catalogue.js';
export { checkCatalogue, slugFromName } from './checks.js';
