export { MyBatchesPage } from './components/my-batches-page.js';
