export {
  loadCatalogue,
  readCatalogue,
  DATA_DIR,
  type Catalogue,
  type DataProblem,
  type FamilyRealignment,
} from './catalogue.js';
export { checkCatalogue, slugFromName } from './checks.js';
export {
  compareWithReference,
  loadReferenceTables,
  missingReferenceFiles,
  readGenusAliases,
  REFERENCE_COMPARISON_FILES,
  type CatalogueNotes,
  type ReferenceTables,
} from './reference/compare-record.js';
