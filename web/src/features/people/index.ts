export { PeoplePage, useSignInWords } from './components/people-page.js';
