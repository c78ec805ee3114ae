export { ShareReportPage } from './components/share-report-page.js';
