export { ChooseSpecies } from './components/choose-species.js';
export { PrintWorkspace } from './components/print-workspace.js';
export { useChosenSpecies } from './hooks/use-chosen-species.js';
export { useCardSelection } from './hooks/use-card-selection.js';
