export { SpeciesImportPanel } from './components/species-import-panel.js';
