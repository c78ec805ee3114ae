export { SeasonBatchesPanel } from './components/season-batches-panel.js';
