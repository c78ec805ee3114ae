export { RecordReferencePanel } from './components/record-reference-panel.js';
export { UnexplainedList } from './components/unexplained-list.js';
