export { MyBatchesPage } from './components/my-batches-page.js';
export { MY_BATCHES_WORDS } from './utils/my-batches-words.js';
