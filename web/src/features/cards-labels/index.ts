export { ChooseSpecies } from './components/choose-species.js';
export { PrintWorkspace } from './components/print-workspace.js';
export { useChosenSpecies } from './hooks/use-chosen-species.js';
export { parseSpeciesParam } from './utils/species-url.js';
