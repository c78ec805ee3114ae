export { changeHeadline, SpeciesHistoryPanel } from './components/species-history-panel.js';
