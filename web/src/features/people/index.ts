export { PeoplePage, signInWords } from './components/people-page.js';
