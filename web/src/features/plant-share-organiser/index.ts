export { OrganiserSharePage } from './components/organiser-share-page.js';
export { PickupPage } from './components/pickup-page.js';
