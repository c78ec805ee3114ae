export { useChangeHeadline, SpeciesHistoryPanel } from './components/species-history-panel.js';
