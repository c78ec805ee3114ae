export { AccountDetails } from './components/account-details.js';
