export { GroupPage } from './components/group-page.js';
